import { ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { DomainError } from './domain-error';
import { type AuthUser, IS_PUBLIC, ROLES_KEY } from './auth.decorators';
import type { Role } from './roles';

/** The one global guard: a valid bearer token unless @Public(), then the route's @Roles(). */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    await (super.canActivate(context) as Promise<boolean>);
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (!roles) {
      // A route without a role declaration is a programming error: refuse rather than guess.
      throw new DomainError('ROUTE_ROLES_UNDECLARED', 'This route declares no roles', 403);
    }
    const user: AuthUser = context.switchToHttp().getRequest().user;
    if (!roles.includes(user.role)) {
      throw new DomainError('FORBIDDEN_ROLE', `This action needs one of the roles: ${roles.join(', ')}`, 403);
    }
    return true;
  }

  override handleRequest<TUser>(err: unknown, user: TUser, info: unknown): TUser {
    // A failure inside validate() (revoked token, or the database being down) keeps its own meaning:
    // an outage must answer 503, not 401, or every client would sign its user out.
    if (err) throw err;
    if (!user) {
      const expired = info instanceof Error && info.name === 'TokenExpiredError';
      throw new DomainError(
        expired ? 'AUTH_TOKEN_EXPIRED' : 'AUTH_REQUIRED',
        expired ? 'Your session has expired; sign in again' : 'Sign in to use this route',
        401,
      );
    }
    return user;
  }
}
