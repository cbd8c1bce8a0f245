import { type ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { AppException } from '../errors/app.exception.js';
import { accessRuleOf } from './access-rule.js';
import { type AuthUser } from './auth-user.js';

/** Global: every non-public route needs a valid access token of an active user. */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override canActivate(context: ExecutionContext) {
    if (accessRuleOf(this.reflector, context.getHandler(), context.getClass()).kind === 'public') return true;
    return super.canActivate(context);
  }

  override handleRequest<TUser = AuthUser>(error: unknown, user: TUser | false, info: unknown): TUser {
    if (error || !user) {
      const expired = info instanceof Error && info.name === 'TokenExpiredError';
      const noToken = info instanceof Error && info.message === 'No auth token';
      // RFC 6750: a bearer-protected resource names its scheme, and why a presented token failed.
      const challenge = noToken ? 'Bearer realm="limitbook"' : 'Bearer realm="limitbook", error="invalid_token"';
      throw new AppException(401, 'UNAUTHENTICATED', expired ? 'Your session has expired. Sign in again.' : 'Sign in to continue.', undefined, {
        'WWW-Authenticate': challenge,
      });
    }
    return user;
  }
}
