import { Inject, Injectable } from '@nestjs/common';
import { type RecordFilter } from '@limitbook/contracts';
import { and, asc, count, desc, eq, gt, gte, ilike, inArray, isNotNull, isNull, lt, lte, or, sql, type SQL } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database, type Executor } from '../../database/database.js';
import {
  calculationRecords,
  impactReports,
  pageRevisions,
  pages,
  users,
  type CalculationRecordRow,
  type ImpactReportRow,
  type NewCalculationRecordRow,
  type PageRevisionRow,
} from '../../database/schema/index.js';

export interface PersonColumns {
  id: string;
  name: string;
  email: string;
}

/** A record with what its permalink shows beside it: the page, the revision and the author. */
export interface RecordView {
  record: CalculationRecordRow;
  documentNumber: string;
  revisionTitle: string;
  revisionSequence: number;
  revisionLetter: string | null;
  revisionState: string;
  creator: PersonColumns | null;
}

export type RevisionOfPage = Pick<PageRevisionRow, 'id' | 'pageId' | 'state' | 'sequence' | 'title' | 'document'>;

export interface RecordListFilter extends Omit<RecordFilter, 'scope'> {
  /** Only this user's records; undefined for everyone's. */
  ownerId?: string;
}

@Injectable()
export class RecordsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async findRevision(pageId: string, revisionId: string): Promise<RevisionOfPage | undefined> {
    const [row] = await this.db
      .select({
        id: pageRevisions.id,
        pageId: pageRevisions.pageId,
        state: pageRevisions.state,
        sequence: pageRevisions.sequence,
        title: pageRevisions.title,
        document: pageRevisions.document,
      })
      .from(pageRevisions)
      .where(and(eq(pageRevisions.id, revisionId), eq(pageRevisions.pageId, pageId)));
    return row;
  }

  async pageExists(pageId: string): Promise<boolean> {
    const [row] = await this.db.select({ id: pages.id }).from(pages).where(eq(pages.id, pageId));
    return row !== undefined;
  }

  async insert(record: NewCalculationRecordRow, executor: Executor = this.db): Promise<CalculationRecordRow> {
    const [row] = await executor.insert(calculationRecords).values(record).returning();
    return row!;
  }

  transaction<T>(work: (tx: Executor) => Promise<T>): Promise<T> {
    return this.db.transaction(work);
  }

  private viewQuery() {
    return this.db
      .select({
        record: calculationRecords,
        documentNumber: pages.documentNumber,
        revisionTitle: pageRevisions.title,
        revisionSequence: pageRevisions.sequence,
        revisionLetter: pageRevisions.revisionLetter,
        revisionState: pageRevisions.state,
        creatorId: users.id,
        creatorName: users.name,
        creatorEmail: users.email,
      })
      .from(calculationRecords)
      .innerJoin(pages, eq(pages.id, calculationRecords.pageId))
      .innerJoin(pageRevisions, eq(pageRevisions.id, calculationRecords.revisionId))
      .leftJoin(users, eq(users.id, calculationRecords.createdBy));
  }

  async find(id: string): Promise<RecordView | undefined> {
    const [row] = await this.viewQuery().where(eq(calculationRecords.id, id));
    return row ? toView(row) : undefined;
  }

  async list(filter: RecordListFilter, limit: number, offset: number): Promise<{ rows: RecordView[]; total: number }> {
    const where = this.where(filter);
    const [rows, [totals]] = await Promise.all([
      this.viewQuery().where(where).orderBy(desc(calculationRecords.createdAt), desc(calculationRecords.id)).limit(limit).offset(offset),
      this.db.select({ total: count() }).from(calculationRecords).innerJoin(pages, eq(pages.id, calculationRecords.pageId)).where(where),
    ]);
    return { rows: rows.map(toView), total: totals?.total ?? 0 };
  }

  private where(filter: RecordListFilter): SQL | undefined {
    const conditions: SQL[] = [];
    if (filter.ownerId) conditions.push(eq(calculationRecords.createdBy, filter.ownerId));
    if (filter.pageId) conditions.push(eq(calculationRecords.pageId, filter.pageId));
    if (filter.ids) conditions.push(inArray(calculationRecords.id, filter.ids));
    if (filter.method) conditions.push(eq(calculationRecords.methodId, filter.method));
    if (filter.verdict === 'none') conditions.push(isNull(calculationRecords.verdict));
    if (filter.verdict === 'pass' || filter.verdict === 'fail') {
      conditions.push(isNotNull(calculationRecords.verdict));
      conditions.push(sql`(${calculationRecords.verdict}->>'pass')::boolean = ${filter.verdict === 'pass'}`);
    }
    if (filter.from) conditions.push(gte(calculationRecords.createdAt, new Date(filter.from)));
    if (filter.to) conditions.push(lte(calculationRecords.createdAt, new Date(filter.to)));
    if (filter.documentNumber) conditions.push(ilike(pages.documentNumber, `%${escapeLike(filter.documentNumber)}%`));
    if (filter.reference) {
      const pattern = `%${escapeLike(filter.reference)}%`;
      conditions.push(
        or(
          ilike(sql`${calculationRecords.reference}->>'partNumber'`, pattern),
          ilike(sql`${calculationRecords.reference}->>'drawing'`, pattern),
          ilike(sql`${calculationRecords.reference}->>'note'`, pattern),
        )!,
      );
    }
    return conditions.length > 0 ? and(...conditions) : undefined;
  }

  /** One chunk of the records made under a revision on the given blocks, in id order after `afterId`. */
  async recordsOnBlocks(revisionId: string, blockIds: string[], afterId: string | null, limit: number): Promise<RecordView[]> {
    if (blockIds.length === 0) return [];
    const conditions: SQL[] = [eq(calculationRecords.revisionId, revisionId), inArray(calculationRecords.blockId, blockIds)];
    if (afterId) conditions.push(gt(calculationRecords.id, afterId));
    const rows = await this.viewQuery()
      .where(and(...conditions))
      .orderBy(asc(calculationRecords.id))
      .limit(limit);
    return rows.map(toView);
  }

  async insertImpactReport(report: typeof impactReports.$inferInsert): Promise<ImpactReportRow> {
    const [row] = await this.db.insert(impactReports).values(report).returning();
    return row!;
  }

  async findImpactReport(id: string): Promise<{ report: ImpactReportRow; creator: PersonColumns | null } | undefined> {
    const [row] = await this.db
      .select({ report: impactReports, creatorId: users.id, creatorName: users.name, creatorEmail: users.email })
      .from(impactReports)
      .leftJoin(users, eq(users.id, impactReports.createdBy))
      .where(eq(impactReports.id, id));
    if (!row) return undefined;
    return { report: row.report, creator: person(row) };
  }

  /** The latest report of the check from one revision to another. */
  async latestImpactReport(fromRevisionId: string, toRevisionId: string): Promise<{ report: ImpactReportRow; creator: PersonColumns | null } | undefined> {
    const [row] = await this.db
      .select({ report: impactReports, creatorId: users.id, creatorName: users.name, creatorEmail: users.email })
      .from(impactReports)
      .leftJoin(users, eq(users.id, impactReports.createdBy))
      .where(and(eq(impactReports.fromRevisionId, fromRevisionId), eq(impactReports.toRevisionId, toRevisionId)))
      .orderBy(desc(impactReports.createdAt), desc(impactReports.id))
      .limit(1);
    return row ? { report: row.report, creator: person(row) } : undefined;
  }

  /** The release that the revision with this sequence replaced: the latest one before it. */
  async releaseBefore(pageId: string, sequence: number): Promise<string | undefined> {
    const [row] = await this.db
      .select({ id: pageRevisions.id })
      .from(pageRevisions)
      .where(and(eq(pageRevisions.pageId, pageId), lt(pageRevisions.sequence, sequence), isNotNull(pageRevisions.revisionLetter)))
      .orderBy(desc(pageRevisions.sequence))
      .limit(1);
    return row?.id;
  }

  /** The reports listing this record among the affected ones, newest first, with the letter of the revision checked against. */
  async impactReportsListing(recordId: string, fromRevisionId: string): Promise<{ report: ImpactReportRow; toRevisionLetter: string | null }[]> {
    return this.db
      .select({ report: impactReports, toRevisionLetter: pageRevisions.revisionLetter })
      .from(impactReports)
      .innerJoin(pageRevisions, eq(pageRevisions.id, impactReports.toRevisionId))
      .where(and(eq(impactReports.fromRevisionId, fromRevisionId), sql`${impactReports.affected} @> ${JSON.stringify([{ recordId }])}::jsonb`))
      .orderBy(desc(impactReports.createdAt), desc(impactReports.id));
  }

  async findPerson(id: string): Promise<PersonColumns | null> {
    const [row] = await this.db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.id, id));
    return row ?? null;
  }
}

function person(row: { creatorId: string | null; creatorName: string | null; creatorEmail: string | null }): PersonColumns | null {
  return row.creatorId ? { id: row.creatorId, name: row.creatorName ?? '', email: row.creatorEmail ?? '' } : null;
}

function toView(row: {
  record: CalculationRecordRow;
  documentNumber: string;
  revisionTitle: string;
  revisionSequence: number;
  revisionLetter: string | null;
  revisionState: string;
  creatorId: string | null;
  creatorName: string | null;
  creatorEmail: string | null;
}): RecordView {
  return {
    record: row.record,
    documentNumber: row.documentNumber,
    revisionTitle: row.revisionTitle,
    revisionSequence: row.revisionSequence,
    revisionLetter: row.revisionLetter,
    revisionState: row.revisionState,
    creator: person(row),
  };
}

/** `%` and `_` typed by a user are literal characters, not wildcards. */
function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (char) => `\\${char}`);
}
