import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];
export type UserRow = Schemas['UserResponseDto'];

export type InviteInput = Schemas['InviteUserDto'];

export type ChangeRoleInput = Schemas['ChangeRoleDto'];
