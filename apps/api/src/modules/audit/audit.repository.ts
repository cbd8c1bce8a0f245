import { Inject, Injectable } from '@nestjs/common';
import { type AuditQuery } from '@limitbook/contracts';
import { and, count, desc, eq, gte, lte, type SQL } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database, type Executor } from '../../database/database.js';
import { auditEvents, type AuditEventRow, type NewAuditEventRow } from '../../database/schema/index.js';

export type AuditFilter = Omit<AuditQuery, 'limit' | 'offset'>;

@Injectable()
export class AuditRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insert(event: NewAuditEventRow, executor: Executor = this.db): Promise<void> {
    await executor.insert(auditEvents).values(event);
  }

  async list(filter: AuditFilter, limit: number, offset: number): Promise<{ rows: AuditEventRow[]; total: number }> {
    const where = this.where(filter);
    const [rows, [totals]] = await Promise.all([
      this.db.select().from(auditEvents).where(where).orderBy(desc(auditEvents.at), desc(auditEvents.id)).limit(limit).offset(offset),
      this.db.select({ total: count() }).from(auditEvents).where(where),
    ]);
    return { rows, total: totals?.total ?? 0 };
  }

  private where(filter: AuditFilter): SQL | undefined {
    const conditions: SQL[] = [];
    if (filter.action) conditions.push(eq(auditEvents.action, filter.action));
    if (filter.actorId) conditions.push(eq(auditEvents.actorId, filter.actorId));
    if (filter.from) conditions.push(gte(auditEvents.at, new Date(filter.from)));
    if (filter.to) conditions.push(lte(auditEvents.at, new Date(filter.to)));
    return conditions.length > 0 ? and(...conditions) : undefined;
  }
}
