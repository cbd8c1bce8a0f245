import { type Reflector } from '@nestjs/core';
import { type Role } from '@limitbook/contracts';
import { ALLOWED_ROLES, IS_PUBLIC } from './access.decorators.js';

// eslint-disable-next-line @typescript-eslint/no-unsafe-function-type
type Target = Function;

export type AccessRule = { kind: 'public' } | { kind: 'roles'; roles: readonly Role[] } | { kind: 'none' };

/** Method-level rules win over class-level ones. */
export function accessRuleOf(reflector: Reflector, handler: Target, controller: Target): AccessRule {
  if (reflector.getAllAndOverride<boolean | undefined>(IS_PUBLIC, [handler, controller])) return { kind: 'public' };
  const allowed = reflector.getAllAndOverride<readonly Role[] | undefined>(ALLOWED_ROLES, [handler, controller]);
  if (allowed && allowed.length > 0) return { kind: 'roles', roles: allowed };
  return { kind: 'none' };
}
