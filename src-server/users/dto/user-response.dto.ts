import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '../../common/roles';

export class UserResponseDto {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES, enumName: 'Role' }) role: Role;
  @ApiProperty({ enum: ['invited', 'active', 'deactivated'] }) status: string;
  @ApiProperty() createdAt: string;
}
