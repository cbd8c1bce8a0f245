import { Inject, Injectable } from '@nestjs/common';
import { and, eq, gt, isNull } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database, type Executor } from '../../database/database.js';
import { oneTimeTokens, type OneTimeTokenPurpose, type OneTimeTokenRow, refreshTokens, type RefreshTokenRow, users, type UserRow } from '../../database/schema/index.js';

@Injectable()
export class AuthRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  transaction<T>(work: (tx: Executor) => Promise<T>): Promise<T> {
    return this.db.transaction(work);
  }

  async findUserByEmail(email: string): Promise<UserRow | undefined> {
    const [row] = await this.db.select().from(users).where(eq(users.email, email));
    return row;
  }

  async findUserById(id: string, executor: Executor = this.db): Promise<UserRow | undefined> {
    const [row] = await executor.select().from(users).where(eq(users.id, id));
    return row;
  }

  /** Runs on every authenticated request: one indexed lookup. */
  async findActiveUser(id: string): Promise<Pick<UserRow, 'id' | 'email' | 'name' | 'role'> | undefined> {
    const [row] = await this.db
      .select({ id: users.id, email: users.email, name: users.name, role: users.role })
      .from(users)
      .where(and(eq(users.id, id), eq(users.status, 'active')));
    return row;
  }

  async recordSignIn(userId: string): Promise<void> {
    await this.db.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, userId));
  }

  async updateUser(userId: string, changes: Partial<Pick<UserRow, 'name' | 'passwordHash' | 'status'>>, executor: Executor = this.db): Promise<void> {
    await executor
      .update(users)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(users.id, userId));
  }

  async insertRefreshToken(token: { userId: string; familyId: string; tokenHash: string; expiresAt: Date }, executor: Executor = this.db): Promise<void> {
    await executor.insert(refreshTokens).values(token);
  }

  async findRefreshToken(tokenHash: string): Promise<RefreshTokenRow | undefined> {
    const [row] = await this.db.select().from(refreshTokens).where(eq(refreshTokens.tokenHash, tokenHash));
    return row;
  }

  /** Reads a token and holds its row until `tx` ends: concurrent refreshes of one token queue here. */
  async lockRefreshToken(tokenHash: string, tx: Executor): Promise<RefreshTokenRow | undefined> {
    const [row] = await tx.select().from(refreshTokens).where(eq(refreshTokens.tokenHash, tokenHash)).for('update');
    return row;
  }

  /** Marks a token used; false if it already was (cannot happen while the row is locked, but costs nothing). */
  async markRotated(id: string, tx: Executor): Promise<boolean> {
    const claimed = await tx
      .update(refreshTokens)
      .set({ rotatedAt: new Date() })
      .where(and(eq(refreshTokens.id, id), isNull(refreshTokens.rotatedAt), isNull(refreshTokens.revokedAt)))
      .returning({ id: refreshTokens.id });
    return claimed.length === 1;
  }

  async revokeFamily(familyId: string): Promise<void> {
    await this.db
      .update(refreshTokens)
      .set({ revokedAt: new Date() })
      .where(and(eq(refreshTokens.familyId, familyId), isNull(refreshTokens.revokedAt)));
  }

  async revokeAllForUser(userId: string, executor: Executor = this.db): Promise<void> {
    await executor
      .update(refreshTokens)
      .set({ revokedAt: new Date() })
      .where(and(eq(refreshTokens.userId, userId), isNull(refreshTokens.revokedAt)));
  }

  async insertOneTimeToken(token: { userId: string; purpose: OneTimeTokenPurpose; tokenHash: string; expiresAt: Date }, executor: Executor = this.db): Promise<void> {
    await executor.insert(oneTimeTokens).values(token);
  }

  /** Earlier links of the same kind stop working when a new one is sent. */
  async retireOneTimeTokens(userId: string, purpose: OneTimeTokenPurpose, executor: Executor = this.db): Promise<void> {
    await executor
      .update(oneTimeTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(oneTimeTokens.userId, userId), eq(oneTimeTokens.purpose, purpose), isNull(oneTimeTokens.usedAt)));
  }

  /** Uses a token once, atomically; undefined when unknown, used or expired. */
  async consumeOneTimeToken(tokenHash: string, purpose: OneTimeTokenPurpose, executor: Executor): Promise<OneTimeTokenRow | undefined> {
    const now = new Date();
    const [row] = await executor
      .update(oneTimeTokens)
      .set({ usedAt: now })
      .where(and(eq(oneTimeTokens.tokenHash, tokenHash), eq(oneTimeTokens.purpose, purpose), isNull(oneTimeTokens.usedAt), gt(oneTimeTokens.expiresAt, now)))
      .returning();
    return row;
  }
}
