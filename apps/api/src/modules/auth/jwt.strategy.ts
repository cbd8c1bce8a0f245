import { createSecretKey } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { z } from 'zod';
import { ActiveUserCache } from '../../common/auth/active-user-cache.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { AuthRepository } from './auth.repository.js';

const payloadSchema = z.object({ sub: z.uuid() });

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    @Inject(APP_CONFIG) config: ResolvedConfig,
    private readonly repository: AuthRepository,
    private readonly activeUsers: ActiveUserCache,
  ) {
    // A key object, not the string: given a string, jsonwebtoken first tries (and fails) to parse it as a
    // public key on every verification, which costs more CPU than the rest of the check.
    const key = createSecretKey(Buffer.from(config.jwtSecret, 'utf8'));
    super({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: key as unknown as Buffer, algorithms: ['HS256'], ignoreExpiration: false });
  }

  /**
   * Checked on every request so deactivation and role changes apply at once, not after the token
   * expires; read through a short-lived cache that this process's user changes invalidate.
   */
  async validate(payload: unknown): Promise<AuthUser | false> {
    const parsed = payloadSchema.safeParse(payload);
    if (!parsed.success) return false;
    return (await this.activeUsers.get(parsed.data.sub, (id) => this.repository.findActiveUser(id))) ?? false;
  }
}
