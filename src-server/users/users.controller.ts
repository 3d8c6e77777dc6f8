import { Body, Controller, Get, HttpCode, Param, Patch, Post, UseGuards } from '@nestjs/common';
import { ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { ParseIdPipe } from '../common/parse-id.pipe';
import { AuthThrottlerGuard } from '../common/auth-throttler.guard';
import { UsersService } from './users.service';
import { InviteUserDto } from './dto/invite-user.dto';
import { ChangeRoleDto } from './dto/update-user.dto';
import { UserResponseDto } from './dto/user-response.dto';

@ApiTags('users')
@Controller('users')
@Roles('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @Roles('admin')
  @ApiOperation({ summary: 'All users (admin)' })
  @ApiOkResponse({ type: [UserResponseDto] })
  list(): Promise<UserResponseDto[]> {
    return this.users.list();
  }

  @Post('invitations')
  @UseGuards(AuthThrottlerGuard)
  @Roles('admin')
  @ApiOperation({ summary: 'Invite a user by e-mail; the link sets their password (admin)' })
  @ApiCreatedResponse({ type: UserResponseDto })
  invite(@Body() body: InviteUserDto, @CurrentUser() actor: AuthUser): Promise<UserResponseDto> {
    return this.users.invite(body, actor);
  }

  @Patch(':id/role')
  @Roles('admin')
  @ApiOperation({ summary: "Change a user's role; their current tokens stop working (admin)" })
  @ApiOkResponse({ type: UserResponseDto })
  changeRole(@Param('id', ParseIdPipe) id: number, @Body() body: ChangeRoleDto, @CurrentUser() actor: AuthUser): Promise<UserResponseDto> {
    return this.users.changeRole(id, body.role, actor);
  }

  @Post(':id/deactivation')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Deactivate a user; their tokens stop working at once (admin)' })
  @ApiOkResponse({ type: UserResponseDto })
  deactivate(@Param('id', ParseIdPipe) id: number, @CurrentUser() actor: AuthUser): Promise<UserResponseDto> {
    return this.users.setActive(id, false, actor);
  }

  @Post(':id/reactivation')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Reactivate a deactivated user (admin)' })
  @ApiOkResponse({ type: UserResponseDto })
  reactivate(@Param('id', ParseIdPipe) id: number, @CurrentUser() actor: AuthUser): Promise<UserResponseDto> {
    return this.users.setActive(id, true, actor);
  }
}
