import { EnumField } from '../../common/dto-fields';
import { ROLES, type Role } from '../../common/roles';

export class ChangeRoleDto {
  @EnumField(ROLES, { enumName: 'Role' })
  role: Role;
}
