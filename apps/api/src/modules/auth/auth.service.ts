import { randomUUID } from 'node:crypto';
import { Inject, Injectable, Logger } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { type AcceptInviteRequest, type ResetPasswordRequest, type SignInRequest, type SignInResponse } from '@limitbook/contracts';
import { ActiveUserCache } from '../../common/auth/active-user-cache.js';
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
import { hashToken, newOpaqueToken, successorKey, successorToken } from './token-hash.js';

/** Rotations that can follow one another inside a grace window; a bound on the successor walk, not a tuning knob. */
const MAX_SUCCESSOR_HOPS = 16;

type RotationOutcome =
  | { kind: 'issued'; user: UserRow; refreshToken: string; expiresAt: Date }
  | { kind: 'reused'; familyId: string; userId: string }
  | { kind: 'inactive'; familyId: string }
  | { kind: 'invalid' };

export interface IssuedSession {
  response: SignInResponse;
  refreshToken: string;
  refreshExpiresAt: Date;
}

@Injectable()
export class AuthService {
  private readonly logger = new Logger('Auth');
  private readonly successorKey: Buffer;

  constructor(
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
    private readonly repository: AuthRepository,
    private readonly passwords: PasswordService,
    private readonly oneTimeTokens: OneTimeTokenService,
    private readonly jwt: JwtService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    private readonly activeUsers: ActiveUserCache,
  ) {
    this.successorKey = successorKey(config.jwtSecret);
  }

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
    // Decide under the row lock, act after commit: a throw inside the transaction would roll back the revocation.
    const outcome = await this.repository.transaction((tx) => this.rotate(refreshToken, tx));
    switch (outcome.kind) {
      case 'issued':
        return this.sessionFor(outcome.user, outcome.refreshToken, outcome.expiresAt);
      case 'reused':
        await this.repository.revokeFamily(outcome.familyId);
        this.logger.warn(`A rotated refresh token was presented again; revoked its session family ${outcome.familyId}.`);
        await this.audit.record({ actor: null, action: 'auth.refresh_reused', subjectType: 'user', subjectId: outcome.userId, detail: { familyId: outcome.familyId } });
        throw AuthException.of('refresh-invalid');
      case 'inactive':
        await this.repository.revokeFamily(outcome.familyId);
        throw AuthException.of('refresh-invalid');
      case 'invalid':
        throw AuthException.of('refresh-invalid');
    }
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
    const userId = await this.repository.transaction(async (tx) => {
      const used = await this.oneTimeTokens.consume(token, 'password_reset', tx);
      if (!used) throw AuthException.of('reset-link-invalid');
      const user = await this.repository.findUserById(used.userId, tx);
      if (!user || user.status !== 'active') throw AuthException.of('reset-link-invalid');
      await this.repository.updateUser(user.id, { passwordHash }, tx);
      // A reset usually means the old password is suspect: end every session that used it.
      await this.repository.revokeAllForUser(user.id, tx);
      await this.audit.record({ actor: { id: user.id, email: user.email }, action: 'user.password_reset', subjectType: 'user', subjectId: user.id }, tx);
      return user.id;
    });
    this.activeUsers.invalidate(userId);
  }

  async acceptInvite({ token, name, password }: AcceptInviteRequest): Promise<void> {
    const passwordHash = await this.passwords.hash(password);
    const userId = await this.repository.transaction(async (tx) => {
      const used = await this.oneTimeTokens.consume(token, 'invite', tx);
      if (!used) throw AuthException.of('invite-link-invalid');
      const user = await this.repository.findUserById(used.userId, tx);
      if (!user || user.status !== 'invited') throw AuthException.of('invite-link-invalid');
      await this.repository.updateUser(user.id, { name, passwordHash, status: 'active' }, tx);
      await this.audit.record({ actor: { id: user.id, email: user.email }, action: 'user.invite_accepted', subjectType: 'user', subjectId: user.id }, tx);
      return user.id;
    });
    this.activeUsers.invalidate(userId);
  }

  /** Ends every session of a user, e.g. on deactivation; pass the caller's transaction. */
  async revokeAllSessions(userId: string, executor?: Executor): Promise<void> {
    await this.repository.revokeAllForUser(userId, executor);
  }

  private async rotate(token: string, tx: Executor): Promise<RotationOutcome> {
    const stored = await this.repository.lockRefreshToken(hashToken(token), tx);
    if (!stored || stored.revokedAt) return { kind: 'invalid' };
    const now = Date.now();
    if (stored.rotatedAt && now - stored.rotatedAt.getTime() > this.config.refreshReuseGraceSeconds * 1000) {
      return { kind: 'reused', familyId: stored.familyId, userId: stored.userId };
    }
    if (!stored.rotatedAt && stored.expiresAt.getTime() <= now) return { kind: 'invalid' };
    const user = await this.repository.findUserById(stored.userId, tx);
    if (!user || user.status !== 'active') return { kind: 'inactive', familyId: stored.familyId };

    if (!stored.rotatedAt) {
      if (!(await this.repository.markRotated(stored.id, tx))) return { kind: 'invalid' };
      const successor = successorToken(token, this.successorKey);
      const expiresAt = new Date(now + this.config.refreshTokenDays * 24 * 60 * 60 * 1000);
      await this.repository.insertRefreshToken({ userId: user.id, familyId: stored.familyId, tokenHash: hashToken(successor), expiresAt }, tx);
      return { kind: 'issued', user, refreshToken: successor, expiresAt };
    }

    // Within the grace window (another tab refreshed first): answer with the successor already issued, not a new fork, so the family keeps one live token and a thief racing its owner is still caught.
    let current = token;
    for (let hop = 0; hop < MAX_SUCCESSOR_HOPS; hop++) {
      const next = successorToken(current, this.successorKey);
      const row = await this.repository.lockRefreshToken(hashToken(next), tx);
      // No derived successor: rotated before successors were derived, or under another JWT secret.
      if (!row || row.revokedAt || row.familyId !== stored.familyId) return { kind: 'invalid' };
      if (!row.rotatedAt) return { kind: 'issued', user, refreshToken: next, expiresAt: row.expiresAt };
      current = next;
    }
    return { kind: 'invalid' };
  }

  private async issueSession(user: UserRow, familyId: string): Promise<IssuedSession> {
    const refreshToken = newOpaqueToken();
    const refreshExpiresAt = new Date(Date.now() + this.config.refreshTokenDays * 24 * 60 * 60 * 1000);
    await this.repository.insertRefreshToken({ userId: user.id, familyId, tokenHash: hashToken(refreshToken), expiresAt: refreshExpiresAt });
    return this.sessionFor(user, refreshToken, refreshExpiresAt);
  }

  private async sessionFor(user: UserRow, refreshToken: string, refreshExpiresAt: Date): Promise<IssuedSession> {
    const accessToken = await this.jwt.signAsync({ sub: user.id }, { expiresIn: this.config.accessTokenSeconds });
    return { response: { accessToken, expiresIn: this.config.accessTokenSeconds, user: toSessionUser(user) }, refreshToken, refreshExpiresAt };
  }
}
