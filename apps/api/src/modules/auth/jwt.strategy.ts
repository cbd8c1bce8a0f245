import { Inject, Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { z } from 'zod';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { AuthRepository } from './auth.repository.js';

const payloadSchema = z.object({ sub: z.uuid() });

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    @Inject(APP_CONFIG) config: ResolvedConfig,
    private readonly repository: AuthRepository,
  ) {
    super({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: config.jwtSecret, algorithms: ['HS256'], ignoreExpiration: false });
  }

  /** Looked up on every request so deactivation and role changes apply at once, not after the token expires. */
  async validate(payload: unknown): Promise<AuthUser | false> {
    const parsed = payloadSchema.safeParse(payload);
    if (!parsed.success) return false;
    return (await this.repository.findActiveUser(parsed.data.sub)) ?? false;
  }
}
