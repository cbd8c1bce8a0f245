import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { ActiveUserCache } from '../../common/auth/active-user-cache.js';
import { JwtAuthGuard } from '../../common/auth/jwt-auth.guard.js';
import { RolesGuard } from '../../common/auth/roles.guard.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { AuditModule } from '../audit/audit.module.js';
import { AuthRateLimitGuard } from './auth-rate-limit.guard.js';
import { AuthController } from './auth.controller.js';
import { AuthRepository } from './auth.repository.js';
import { AuthService } from './auth.service.js';
import { JwtStrategy } from './jwt.strategy.js';
import { OneTimeTokenService } from './one-time-token.service.js';
import { PasswordService } from './password.service.js';

@Module({
  imports: [
    PassportModule,
    AuditModule,
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: ResolvedConfig) => ({ secret: config.jwtSecret, signOptions: { algorithm: 'HS256' } }),
    }),
    ThrottlerModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: ResolvedConfig) => ({
        throttlers: [{ name: 'auth', limit: config.authRateLimit.limit, ttl: config.authRateLimit.windowSeconds * 1000 }],
        errorMessage: 'Too many attempts. Wait a minute, then try again.',
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    AuthRepository,
    PasswordService,
    OneTimeTokenService,
    JwtStrategy,
    { provide: ActiveUserCache, useFactory: () => new ActiveUserCache() },
    AuthRateLimitGuard,
    // Order matters: authenticate first, then check the role.
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
  exports: [AuthService, PasswordService, OneTimeTokenService, ActiveUserCache],
})
export class AuthModule {}
