import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];
export type LoginInput = Schemas['LoginDto'];

export type LoginResult = Schemas['LoginResponseDto'];

/** An invitation's or a reset's e-mailed token with the new password (and, for an invitation, a name). */
export type SetPasswordInput = Schemas['TokenPasswordDto'];

export type ResetRequest = Schemas['RequestResetDto'];
