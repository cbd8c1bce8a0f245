import { type CanActivate, type ExecutionContext, Injectable, Logger } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AppException } from '../errors/app.exception.js';
import { accessRuleOf } from './access-rule.js';
import { type AuthUser } from './auth-user.js';

/** Global, after JwtAuthGuard. Deny by default: a route without @Public or @Roles is refused. */
@Injectable()
export class RolesGuard implements CanActivate {
  private readonly logger = new Logger(RolesGuard.name);

  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const rule = accessRuleOf(this.reflector, context.getHandler(), context.getClass());
    if (rule.kind === 'public') return true;
    if (rule.kind === 'none') {
      this.logger.error(`${context.getClass().name}.${context.getHandler().name} has neither @Public nor @Roles; refusing it.`);
      throw new AppException(403, 'FORBIDDEN', 'This route has no access rule.');
    }
    const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
    if (!user || !rule.roles.includes(user.role)) throw new AppException(403, 'FORBIDDEN', 'Your role does not allow this.');
    return true;
  }
}
