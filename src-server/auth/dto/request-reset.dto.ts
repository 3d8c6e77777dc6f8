import { EmailField } from '../../common/dto-fields';

export class RequestResetDto {
  @EmailField()
  email: string;
}
