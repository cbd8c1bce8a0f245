import { Inject, Injectable } from '@nestjs/common';
import { and, asc, count, eq, inArray, ne } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database, type Executor } from '../../database/database.js';
import { type NewUserRow, users, type UserRow } from '../../database/schema/index.js';

@Injectable()
export class UsersRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  transaction<T>(work: (tx: Executor) => Promise<T>): Promise<T> {
    return this.db.transaction(work);
  }

  async list(limit: number, offset: number): Promise<{ rows: UserRow[]; total: number }> {
    const [rows, [totals]] = await Promise.all([
      this.db.select().from(users).orderBy(asc(users.name), asc(users.email)).limit(limit).offset(offset),
      this.db.select({ total: count() }).from(users),
    ]);
    return { rows, total: totals?.total ?? 0 };
  }

  /** Active users who may review (role reviewer or admin), by name. */
  async listActiveReviewers(): Promise<UserRow[]> {
    return this.db
      .select()
      .from(users)
      .where(and(inArray(users.role, ['reviewer', 'admin']), eq(users.status, 'active')))
      .orderBy(asc(users.name), asc(users.email));
  }

  async count(): Promise<number> {
    const [row] = await this.db.select({ total: count() }).from(users);
    return row?.total ?? 0;
  }

  /** Locks the row for the rest of the transaction so concurrent edits serialise. */
  async findForUpdate(id: string, tx: Executor): Promise<UserRow | undefined> {
    const [row] = await tx.select().from(users).where(eq(users.id, id)).for('update');
    return row;
  }

  async findByEmail(email: string, executor: Executor = this.db): Promise<UserRow | undefined> {
    const [row] = await executor.select().from(users).where(eq(users.email, email));
    return row;
  }

  /** Locks every active admin row, so two admins cannot demote each other at once and leave none. */
  async countOtherActiveAdmins(exceptId: string, tx: Executor): Promise<number> {
    const rows = await tx
      .select({ id: users.id })
      .from(users)
      .where(and(eq(users.role, 'admin'), eq(users.status, 'active'), ne(users.id, exceptId)))
      .for('update');
    return rows.length;
  }

  async insert(user: NewUserRow, executor: Executor = this.db): Promise<UserRow> {
    const [row] = await executor.insert(users).values(user).returning();
    return row!;
  }

  async update(id: string, changes: Partial<Pick<UserRow, 'name' | 'role' | 'status' | 'passwordHash'>>, executor: Executor = this.db): Promise<UserRow> {
    const [row] = await executor
      .update(users)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(users.id, id))
      .returning();
    return row!;
  }
}
