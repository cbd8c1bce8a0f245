import { Inject, Injectable } from '@nestjs/common';
import { type InviteUserRequest, type PageQuery, type UpdateUserRequest, type User, type UserList, type UserStatus } from '@limitbook/contracts';
import { ActiveUserCache } from '../../common/auth/active-user-cache.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { AuditService } from '../audit/audit.service.js';
import { AuthService } from '../auth/auth.service.js';
import { inviteValidDays, OneTimeTokenService } from '../auth/one-time-token.service.js';
import { MailService } from '../mail/mail.service.js';
import { invitationMail } from '../mail/templates/invitation.mail.js';
import { toUser } from './dto/user.dto.js';
import { UsersException } from './users.exception.js';
import { UsersRepository } from './users.repository.js';

@Injectable()
export class UsersService {
  constructor(
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
    private readonly repository: UsersRepository,
    private readonly auth: AuthService,
    private readonly oneTimeTokens: OneTimeTokenService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    private readonly activeUsers: ActiveUserCache,
  ) {}

  async list(query: PageQuery): Promise<UserList> {
    const { rows, total } = await this.repository.list(query.limit, query.offset);
    return { items: rows.map(toUser), total };
  }

  /** A pending invitation can be sent again (a fresh link, the old one stops working); an existing account cannot be invited. */
  async invite(actor: AuthUser, request: InviteUserRequest): Promise<User> {
    const { user, token } = await this.repository.transaction(async (tx) => {
      const existing = await this.repository.findByEmail(request.email, tx);
      if (existing && existing.status !== 'invited') throw UsersException.of('email-taken');
      const user = existing
        ? await this.repository.update(existing.id, { name: request.name, role: request.role }, tx)
        : await this.repository.insert({ email: request.email, name: request.name, role: request.role, status: 'invited' }, tx);
      const token = await this.oneTimeTokens.issue(user.id, 'invite', tx);
      await this.audit.record(
        { actor, action: 'user.invited', subjectType: 'user', subjectId: user.id, detail: { email: user.email, role: user.role, resent: Boolean(existing) } },
        tx,
      );
      return { user, token };
    });
    const url = `${this.config.publicUrl}/accept-invite?token=${encodeURIComponent(token)}`;
    this.mail.dispatch({ to: user.email, ...invitationMail({ inviterName: actor.name, role: user.role, url, validDays: inviteValidDays }) });
    return toUser(user);
  }

  async update(actor: AuthUser, id: string, request: UpdateUserRequest): Promise<User> {
    try {
      return await this.applyUpdate(actor, id, request);
    } finally {
      // After the commit (or rollback): the guard's next lookup of this user reads the new row.
      this.activeUsers.invalidate(id);
    }
  }

  private async applyUpdate(actor: AuthUser, id: string, request: UpdateUserRequest): Promise<User> {
    return this.repository.transaction(async (tx) => {
      const current = await this.repository.findForUpdate(id, tx);
      if (!current) throw UsersException.of('not-found');

      const status = nextStatus(current.status, current.passwordHash !== null, request.active);
      const role = request.role ?? current.role;
      const losesActiveAdmin = current.role === 'admin' && current.status === 'active' && (role !== 'admin' || status !== 'active');
      if (request.active === false && current.id === actor.id) throw UsersException.of('self-deactivation');
      if (losesActiveAdmin && (await this.repository.countOtherActiveAdmins(current.id, tx)) === 0) throw UsersException.of('last-admin');

      const updated = await this.repository.update(id, { role, status, ...(request.name !== undefined ? { name: request.name } : {}) }, tx);
      const subject = { subjectType: 'user', subjectId: id };
      if (role !== current.role) {
        await this.audit.record({ actor, action: 'user.role_changed', ...subject, detail: { email: current.email, from: current.role, to: role } }, tx);
      }
      if (status !== current.status) {
        const action = status === 'deactivated' ? 'user.deactivated' : 'user.reactivated';
        await this.audit.record({ actor, action, ...subject, detail: { email: current.email, from: current.status, to: status } }, tx);
        if (status === 'deactivated') await this.auth.revokeAllSessions(id, tx);
      }
      if (request.name !== undefined && request.name !== current.name) {
        await this.audit.record({ actor, action: 'user.renamed', ...subject, detail: { from: current.name, to: request.name } }, tx);
      }
      return toUser(updated);
    });
  }
}

/** Reactivating returns an account to where it was: active with a password, otherwise still invited. */
function nextStatus(current: UserStatus, hasPassword: boolean, active: boolean | undefined): UserStatus {
  if (active === undefined) return current;
  if (!active) return 'deactivated';
  if (current !== 'deactivated') return current;
  return hasPassword ? 'active' : 'invited';
}
