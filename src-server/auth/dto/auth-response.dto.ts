import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '../../common/roles';

export class MeDto {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES, enumName: 'Role' }) role: Role;
}

export class LoginResponseDto {
  @ApiProperty() accessToken: string;
  @ApiProperty({ description: 'Seconds until the token expires' }) expiresIn: number;
  @ApiProperty({ type: MeDto }) user: MeDto;
}
