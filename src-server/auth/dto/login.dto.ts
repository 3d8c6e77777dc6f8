import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength } from 'class-validator';
import { EmailField } from '../../common/dto-fields';

export class LoginDto {
  @EmailField({ example: 'engineer@bandwright.test' })
  email: string;

  @ApiProperty({ example: 'bandwright-demo', maxLength: 200 })
  @IsString()
  @MaxLength(200)
  password: string;
}
