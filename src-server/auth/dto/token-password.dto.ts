import { StringField } from '../../common/dto-fields';

/** Accepting an invitation or finishing a password reset: the e-mailed token and the new password. */
export class TokenPasswordDto {
  @StringField({ minLength: 20, maxLength: 200, description: 'The token from the e-mailed link' })
  token: string;

  @StringField({ minLength: 10, maxLength: 200, description: 'The new password (at least 10 characters)' })
  password: string;

  @StringField({ optional: true, maxLength: 120, description: 'Display name (invitation only)' })
  name?: string;
}
