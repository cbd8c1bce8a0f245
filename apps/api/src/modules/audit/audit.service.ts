import { Injectable } from '@nestjs/common';
import { type AuditEvent, type AuditList, type AuditQuery } from '@limitbook/contracts';
import { type Executor } from '../../database/database.js';
import { type AuditEventRow } from '../../database/schema/index.js';
import { type AuditFilter, AuditRepository } from './audit.repository.js';
import { toCsv } from '../../common/csv/csv.js';

export interface AuditActor {
  id: string;
  email: string;
}

export interface AuditRecord {
  /** Null for the system itself (seeding, bootstrap). */
  actor: AuditActor | null;
  action: string;
  subjectType: string;
  subjectId?: string | null;
  detail?: Record<string, unknown>;
}

/** Rows per CSV export; beyond that, narrow the filter. */
const exportLimit = 50_000;

@Injectable()
export class AuditService {
  constructor(private readonly repository: AuditRepository) {}

  /** Pass the transaction of the change being audited, so both land or neither does. */
  async record(entry: AuditRecord, executor?: Executor): Promise<void> {
    await this.repository.insert(
      {
        actorId: entry.actor?.id ?? null,
        actorEmail: entry.actor?.email ?? null,
        action: entry.action,
        subjectType: entry.subjectType,
        subjectId: entry.subjectId ?? null,
        detail: entry.detail ?? {},
      },
      executor,
    );
  }

  async list(query: AuditQuery): Promise<AuditList> {
    const { limit, offset, ...filter } = query;
    const { rows, total } = await this.repository.list(filter, limit, offset);
    return { items: rows.map(toAuditEvent), total };
  }

  async exportCsv(filter: AuditFilter): Promise<string> {
    const { rows } = await this.repository.list(filter, exportLimit, 0);
    const header = ['at', 'actor_email', 'actor_id', 'action', 'subject_type', 'subject_id', 'detail'];
    return toCsv([
      header,
      ...rows.map((row) => [row.at.toISOString(), row.actorEmail, row.actorId, row.action, row.subjectType, row.subjectId, JSON.stringify(row.detail)]),
    ]);
  }
}

function toAuditEvent(row: AuditEventRow): AuditEvent {
  return {
    id: row.id,
    at: row.at.toISOString(),
    actorId: row.actorId,
    actorEmail: row.actorEmail,
    action: row.action,
    subjectType: row.subjectType,
    subjectId: row.subjectId,
    detail: row.detail,
  };
}
