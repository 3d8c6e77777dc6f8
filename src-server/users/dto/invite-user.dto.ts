import { EmailField, EnumField, StringField } from '../../common/dto-fields';
import { ROLES, type Role } from '../../common/roles';

export class InviteUserDto {
  @EmailField({ example: 'new.colleague@bandwright.test' })
  email: string;

  @StringField({ maxLength: 120, example: 'New Colleague' })
  name: string;

  @EnumField(ROLES, { enumName: 'Role' })
  role: Role;
}
