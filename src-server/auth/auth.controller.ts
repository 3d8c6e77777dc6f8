import { Body, Controller, Get, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Public, Roles } from '../common/auth.decorators';
import { ALL_ROLES } from '../common/roles';
import { AuthThrottlerGuard } from '../common/auth-throttler.guard';
import { AuthService } from './auth.service';
import { LoginResponseDto, MeDto } from './dto/auth-response.dto';
import { LoginDto } from './dto/login.dto';
import { RequestResetDto } from './dto/request-reset.dto';
import { TokenPasswordDto } from './dto/token-password.dto';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Post('login')
  @UseGuards(AuthThrottlerGuard)
  @Public()
  @HttpCode(200)
  @ApiOperation({ summary: 'Sign in with e-mail and password; returns a bearer token' })
  @ApiOkResponse({ type: LoginResponseDto })
  login(@Body() body: LoginDto): Promise<LoginResponseDto> {
    return this.auth.login(body.email, body.password);
  }

  @Get('me')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The signed-in user' })
  @ApiOkResponse({ type: MeDto })
  me(@CurrentUser() user: AuthUser): MeDto {
    return user;
  }

  @Post('logout')
  @Roles(...ALL_ROLES)
  @HttpCode(204)
  @ApiOperation({ summary: "Sign out: ends the caller's tokens on every device" })
  @ApiNoContentResponse()
  logout(@CurrentUser() user: AuthUser): Promise<void> {
    return this.auth.logout(user);
  }

  @Post('accept-invitation')
  @UseGuards(AuthThrottlerGuard)
  @Public()
  @HttpCode(200)
  @ApiOperation({ summary: 'Set a password with the token from an invitation e-mail; signs the user in' })
  @ApiOkResponse({ type: LoginResponseDto })
  acceptInvitation(@Body() body: TokenPasswordDto): Promise<LoginResponseDto> {
    return this.auth.acceptInvitation(body.token, body.password, body.name);
  }

  @Post('password-reset-requests')
  @UseGuards(AuthThrottlerGuard)
  @Public()
  @HttpCode(202)
  @ApiOperation({ summary: 'E-mail a password-reset link (answers 202 whether or not the e-mail is known)' })
  requestReset(@Body() body: RequestResetDto): { status: string } {
    this.auth.requestPasswordReset(body.email);
    return { status: 'accepted' };
  }

  @Post('password-reset')
  @UseGuards(AuthThrottlerGuard)
  @Public()
  @HttpCode(200)
  @ApiOperation({ summary: 'Set a new password with the token from a reset e-mail; signs the user in' })
  @ApiOkResponse({ type: LoginResponseDto })
  resetPassword(@Body() body: TokenPasswordDto): Promise<LoginResponseDto> {
    return this.auth.resetPassword(body.token, body.password);
  }
}
