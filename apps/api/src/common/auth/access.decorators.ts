import { SetMetadata, createParamDecorator, type ExecutionContext } from '@nestjs/common';
import { type Role, roles } from '@limitbook/contracts';
import { type AuthUser } from './auth-user.js';

export const IS_PUBLIC = 'limitbook:public';
export const ALLOWED_ROLES = 'limitbook:roles';

/** Open to anyone, signed in or not. Every route needs this or @Roles: the guards refuse routes with neither. */
export const Public = (): MethodDecorator & ClassDecorator => SetMetadata(IS_PUBLIC, true);

/** Signed-in users holding one of these roles. */
export const Roles = (...allowed: Role[]): MethodDecorator & ClassDecorator => SetMetadata(ALLOWED_ROLES, allowed);

/** Every role: use as `@Roles(...AnySignedIn)`. */
export const AnySignedIn: readonly Role[] = roles;

export const CurrentUser = createParamDecorator((_data: unknown, context: ExecutionContext): AuthUser => {
  const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
  if (!user) throw new Error('CurrentUser used on a route without authentication');
  return user;
});
