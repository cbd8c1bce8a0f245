import { randomUUID } from 'node:crypto';
import { Inject, Injectable, Logger } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { type AcceptInviteRequest, type ResetPasswordRequest, type SignInRequest, type SignInResponse } from '@limitbook/contracts';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { type Executor } from '../../database/database.js';
import { type UserRow } from '../../database/schema/index.js';
import { AuditService } from '../audit/audit.service.js';
import { MailService } from '../mail/mail.service.js';
import { passwordResetMail } from '../mail/templates/password-reset.mail.js';
import { AuthException } from './auth.exception.js';
import { AuthRepository } from './auth.repository.js';
import { toSessionUser } from './dto/session-user.dto.js';
import { OneTimeTokenService, resetValidMinutes } from './one-time-token.service.js';
import { PasswordService } from './password.service.js';
import { hashToken, newOpaqueToken } from './token-hash.js';

export interface IssuedSession {
  response: SignInResponse;
  refreshToken: string;
  refreshExpiresAt: Date;
}

@Injectable()
export class AuthService {
  private readonly logger = new Logger('Auth');

  constructor(
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
    private readonly repository: AuthRepository,
    private readonly passwords: PasswordService,
    private readonly oneTimeTokens: OneTimeTokenService,
    private readonly jwt: JwtService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
  ) {}

  async signIn({ email, password }: SignInRequest): Promise<IssuedSession> {
    const user = await this.repository.findUserByEmail(email);
    if (!user?.passwordHash) {
      await this.passwords.verifyAgainstNothing(password);
      throw AuthException.of('invalid-credentials');
    }
    if (!(await this.passwords.verify(user.passwordHash, password))) throw AuthException.of('invalid-credentials');
    if (user.status !== 'active') throw AuthException.of('deactivated');
    await this.repository.recordSignIn(user.id);
    return this.issueSession(user, randomUUID());
  }

  async refresh(refreshToken: string | undefined): Promise<IssuedSession> {
    if (!refreshToken) throw AuthException.of('no-refresh-token');
    const stored = await this.repository.findRefreshToken(hashToken(refreshToken));
    if (!stored) throw AuthException.of('refresh-invalid');
    if (stored.revokedAt) throw AuthException.of('refresh-invalid');
    if (stored.rotatedAt || !(await this.repository.claimRefreshToken(stored.id))) {
      await this.repository.revokeFamily(stored.familyId);
      this.logger.warn(`A rotated refresh token was presented again; revoked its session family ${stored.familyId}.`);
      await this.audit.record({ actor: null, action: 'auth.refresh_reused', subjectType: 'user', subjectId: stored.userId, detail: { familyId: stored.familyId } });
      throw AuthException.of('refresh-invalid');
    }
    if (stored.expiresAt.getTime() <= Date.now()) throw AuthException.of('refresh-invalid');
    const user = await this.repository.findUserById(stored.userId);
    if (!user || user.status !== 'active') {
      await this.repository.revokeFamily(stored.familyId);
      throw AuthException.of('refresh-invalid');
    }
    return this.issueSession(user, stored.familyId);
  }

  async signOut(refreshToken: string | undefined): Promise<void> {
    if (!refreshToken) return;
    const stored = await this.repository.findRefreshToken(hashToken(refreshToken));
    if (stored) await this.repository.revokeFamily(stored.familyId);
  }

  /** Answers the same whether or not the address is known; mail goes out in the background. */
  async forgotPassword(email: string): Promise<void> {
    const user = await this.repository.findUserByEmail(email);
    if (!user || user.status !== 'active') return;
    const token = await this.oneTimeTokens.issue(user.id, 'password_reset');
    const url = `${this.config.publicUrl}/reset-password?token=${encodeURIComponent(token)}`;
    this.mail.dispatch({ to: user.email, ...passwordResetMail({ name: user.name, url, validMinutes: resetValidMinutes }) });
  }

  async resetPassword({ token, password }: ResetPasswordRequest): Promise<void> {
    const passwordHash = await this.passwords.hash(password);
    await this.repository.transaction(async (tx) => {
      const used = await this.oneTimeTokens.consume(token, 'password_reset', tx);
      if (!used) throw AuthException.of('reset-link-invalid');
      const user = await this.repository.findUserById(used.userId, tx);
      if (!user || user.status !== 'active') throw AuthException.of('reset-link-invalid');
      await this.repository.updateUser(user.id, { passwordHash }, tx);
      // A reset usually means the old password is suspect: end every session that used it.
      await this.repository.revokeAllForUser(user.id, tx);
      await this.audit.record({ actor: { id: user.id, email: user.email }, action: 'user.password_reset', subjectType: 'user', subjectId: user.id }, tx);
    });
  }

  async acceptInvite({ token, name, password }: AcceptInviteRequest): Promise<void> {
    const passwordHash = await this.passwords.hash(password);
    await this.repository.transaction(async (tx) => {
      const used = await this.oneTimeTokens.consume(token, 'invite', tx);
      if (!used) throw AuthException.of('invite-link-invalid');
      const user = await this.repository.findUserById(used.userId, tx);
      if (!user || user.status !== 'invited') throw AuthException.of('invite-link-invalid');
      await this.repository.updateUser(user.id, { name, passwordHash, status: 'active' }, tx);
      await this.audit.record({ actor: { id: user.id, email: user.email }, action: 'user.invite_accepted', subjectType: 'user', subjectId: user.id }, tx);
    });
  }

  /** Ends every session of a user, e.g. on deactivation; pass the caller's transaction. */
  async revokeAllSessions(userId: string, executor?: Executor): Promise<void> {
    await this.repository.revokeAllForUser(userId, executor);
  }

  private async issueSession(user: UserRow, familyId: string): Promise<IssuedSession> {
    const refreshToken = newOpaqueToken();
    const refreshExpiresAt = new Date(Date.now() + this.config.refreshTokenDays * 24 * 60 * 60 * 1000);
    await this.repository.insertRefreshToken({ userId: user.id, familyId, tokenHash: hashToken(refreshToken), expiresAt: refreshExpiresAt });
    const accessToken = await this.jwt.signAsync({ sub: user.id }, { expiresIn: this.config.accessTokenSeconds });
    return { response: { accessToken, expiresIn: this.config.accessTokenSeconds, user: toSessionUser(user) }, refreshToken, refreshExpiresAt };
  }
}
