import { applyDecorators, createParamDecorator, ExecutionContext, SetMetadata } from '@nestjs/common';
import { ApiBearerAuth, ApiExtension, ApiForbiddenResponse, ApiUnauthorizedResponse } from '@nestjs/swagger';
import type { Role } from './roles';

export const IS_PUBLIC = 'bandwright:isPublic';
export const ROLES_KEY = 'bandwright:roles';

/** The signed-in user as the JWT strategy resolved it. */
export interface AuthUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

/** Opt a route out of the global JWT guard; documented as `x-roles: ["public"]`. */
export const Public = () => applyDecorators(SetMetadata(IS_PUBLIC, true), ApiExtension('x-roles', ['public']));

/** The roles that may call a route; documented in OpenAPI as `x-roles`, enforced by the global guard. */
export const Roles = (...roles: Role[]) =>
  applyDecorators(
    SetMetadata(ROLES_KEY, roles),
    ApiBearerAuth(),
    ApiExtension('x-roles', roles),
    ApiUnauthorizedResponse({ description: 'No valid bearer token' }),
    ApiForbiddenResponse({ description: `Only for: ${roles.join(', ')}` }),
  );

export const CurrentUser = createParamDecorator((_data: unknown, ctx: ExecutionContext): AuthUser => {
  return ctx.switchToHttp().getRequest().user;
});
