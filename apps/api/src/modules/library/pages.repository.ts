import { Inject, Injectable } from '@nestjs/common';
import { type PersonRef, type RevisionState } from '@limitbook/contracts';
import { and, arrayContains, asc, desc, eq, inArray, isNotNull, type SQL, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database, type Executor } from '../../database/database.js';
import {
  type CollectionRow,
  collections,
  type NewPageRow,
  pageRevisions,
  type PageRevisionRow,
  type PageRow,
  pages,
  users,
} from '../../database/schema/index.js';
import { type PageContent } from './page-content.js';
import { isUniqueViolation } from './unique-violation.js';

export interface PageWithCollection {
  page: PageRow;
  collection: CollectionRow;
}

export interface PageListRow extends PageWithCollection {
  title: string;
  publishedAt: Date | null;
  hasDraft: boolean;
}

export interface PageListFilter {
  collectionKey?: string;
  tag?: string;
  /** Readers: only pages with a published revision, ordered by publication. */
  publishedOnly: boolean;
  sort: 'number' | 'recent';
  limit: number;
  offset: number;
}

export interface NewRevision {
  pageId: string;
  documentNumber: string;
  state: RevisionState;
  title: string;
  content: PageContent;
  userId: string | null;
}

const publishedRevision = alias(pageRevisions, 'published_revision');
const draftRevision = alias(pageRevisions, 'draft_revision');

/**
 * The search columns are computed here, from the same values as the row they belong to,
 * so every write of a revision keeps them current. 'english' stays literal: a bound
 * parameter would not resolve to a text search configuration.
 */
function searchVector(documentNumber: string, title: string, content: PageContent): SQL {
  return sql`setweight(to_tsvector('english', ${`${documentNumber} ${title}`}), 'A') || setweight(to_tsvector('english', ${content.searchCaptions}), 'B') || setweight(to_tsvector('english', ${content.searchText}), 'C')`;
}

function contentColumns(documentNumber: string, title: string, content: PageContent) {
  return {
    title,
    document: content.document,
    searchText: content.searchText,
    searchCaptions: content.searchCaptions,
    searchVector: searchVector(documentNumber, title, content),
  };
}

@Injectable()
export class PagesRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  transaction<T>(work: (tx: Executor) => Promise<T>): Promise<T> {
    return this.db.transaction(work);
  }

  async findPage(ref: { id: string } | { documentNumber: string }, executor: Executor = this.db): Promise<PageWithCollection | undefined> {
    const where = 'id' in ref ? eq(pages.id, ref.id) : eq(pages.documentNumber, ref.documentNumber);
    const [row] = await executor.select({ page: pages, collection: collections }).from(pages).innerJoin(collections, eq(collections.id, pages.collectionId)).where(where);
    return row;
  }

  /** Locks the page row so publication, draft start and deletion of one page serialise. */
  async lockPage(id: string, tx: Executor): Promise<PageRow | undefined> {
    const [row] = await tx.select().from(pages).where(eq(pages.id, id)).for('update');
    return row;
  }

  async listPages(filter: PageListFilter): Promise<{ rows: PageListRow[]; total: number }> {
    const conditions: SQL[] = [];
    if (filter.publishedOnly) conditions.push(isNotNull(pages.currentPublishedRevisionId));
    if (filter.collectionKey) conditions.push(eq(collections.key, filter.collectionKey));
    if (filter.tag) conditions.push(arrayContains(pages.tags, [filter.tag]));
    const where = conditions.length > 0 ? and(...conditions) : undefined;
    const order =
      filter.sort === 'number'
        ? [asc(pages.documentNumber)]
        : filter.publishedOnly
          ? [desc(publishedRevision.publishedAt), asc(pages.documentNumber)]
          : [desc(pages.updatedAt), asc(pages.documentNumber)];
    const [rows, [totals]] = await Promise.all([
      this.db
        .select({
          page: pages,
          collection: collections,
          title: sql<string>`coalesce(${publishedRevision.title}, ${draftRevision.title}, '')`,
          publishedAt: publishedRevision.publishedAt,
          hasDraft: sql<boolean>`${draftRevision.id} is not null`,
        })
        .from(pages)
        .innerJoin(collections, eq(collections.id, pages.collectionId))
        .leftJoin(publishedRevision, eq(publishedRevision.id, pages.currentPublishedRevisionId))
        .leftJoin(draftRevision, and(eq(draftRevision.pageId, pages.id), eq(draftRevision.state, 'draft')))
        .where(where)
        .orderBy(...order)
        .limit(filter.limit)
        .offset(filter.offset),
      this.db
        .select({ total: sql<number>`cast(count(*) as int)` })
        .from(pages)
        .innerJoin(collections, eq(collections.id, pages.collectionId))
        .where(where),
    ]);
    return { rows, total: totals?.total ?? 0 };
  }

  /** Tags in use with the number of pages carrying each; `publishedOnly` counts pages readers can open. */
  async listTags(publishedOnly: boolean): Promise<{ tag: string; count: number }[]> {
    const tag = sql<string>`tag`;
    return this.db
      .select({ tag, count: sql<number>`cast(count(*) as int)` })
      .from(sql`${pages}, unnest(${pages.tags}) as tag`)
      .where(publishedOnly ? isNotNull(pages.currentPublishedRevisionId) : undefined)
      .groupBy(tag)
      .orderBy(asc(tag));
  }

  /** Undefined when the document number is taken. */
  async insertPage(values: NewPageRow, executor: Executor = this.db): Promise<PageRow | undefined> {
    try {
      const [row] = await executor.insert(pages).values(values).returning();
      return row;
    } catch (error) {
      if (isUniqueViolation(error)) return undefined;
      throw error;
    }
  }

  async updatePage(id: string, changes: Partial<Pick<PageRow, 'collectionId' | 'tags' | 'ownerId' | 'currentPublishedRevisionId'>>, executor: Executor = this.db): Promise<PageRow> {
    const [row] = await executor
      .update(pages)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(pages.id, id))
      .returning();
    return row!;
  }

  async deletePage(id: string, executor: Executor = this.db): Promise<void> {
    await executor.delete(pages).where(eq(pages.id, id));
  }

  async findRevision(id: string, executor: Executor = this.db): Promise<PageRevisionRow | undefined> {
    const [row] = await executor.select().from(pageRevisions).where(eq(pageRevisions.id, id));
    return row;
  }

  async findDraft(pageId: string, executor: Executor = this.db): Promise<PageRevisionRow | undefined> {
    const [row] = await executor
      .select()
      .from(pageRevisions)
      .where(and(eq(pageRevisions.pageId, pageId), eq(pageRevisions.state, 'draft')));
    return row;
  }

  /** Undefined when the page already has a draft (one draft per page, by a unique index). */
  async insertRevision(revision: NewRevision, executor: Executor = this.db): Promise<PageRevisionRow | undefined> {
    const now = new Date();
    const sequence = sql<number>`(select coalesce(max(${pageRevisions.sequence}), 0) + 1 from ${pageRevisions} where ${pageRevisions.pageId} = ${revision.pageId})`;
    try {
      const [row] = await executor
        .insert(pageRevisions)
        .values({
          pageId: revision.pageId,
          sequence,
          state: revision.state,
          ...contentColumns(revision.documentNumber, revision.title, revision.content),
          createdBy: revision.userId,
          updatedBy: revision.userId,
          createdAt: now,
          updatedAt: now,
          ...(revision.state === 'published' ? { publishedAt: now, publishedBy: revision.userId } : {}),
        })
        .returning();
      return row;
    } catch (error) {
      if (isUniqueViolation(error, 'page_revisions_one_draft_idx')) return undefined;
      throw error;
    }
  }

  /**
   * Writes a draft only if it is still at `baseVersion`, in one statement: of two saves from
   * the same version, the database lets exactly one through. Undefined means stale (or gone).
   */
  async saveDraft(
    draftId: string,
    baseVersion: number,
    change: { documentNumber: string; title: string; content: PageContent; userId: string },
    executor: Executor = this.db,
  ): Promise<PageRevisionRow | undefined> {
    const [row] = await executor
      .update(pageRevisions)
      .set({
        ...contentColumns(change.documentNumber, change.title, change.content),
        version: sql`${pageRevisions.version} + 1`,
        updatedBy: change.userId,
        updatedAt: new Date(),
      })
      .where(and(eq(pageRevisions.id, draftId), eq(pageRevisions.state, 'draft'), eq(pageRevisions.version, baseVersion)))
      .returning();
    return row;
  }

  /** The draft at `baseVersion` becomes published; undefined when it moved on meanwhile. */
  async publishDraft(draftId: string, baseVersion: number, userId: string | null, executor: Executor = this.db): Promise<PageRevisionRow | undefined> {
    const now = new Date();
    const [row] = await executor
      .update(pageRevisions)
      .set({ state: 'published', publishedAt: now, publishedBy: userId, updatedAt: now })
      .where(and(eq(pageRevisions.id, draftId), eq(pageRevisions.state, 'draft'), eq(pageRevisions.version, baseVersion)))
      .returning();
    return row;
  }

  async deleteRevision(id: string, executor: Executor = this.db): Promise<void> {
    await executor.delete(pageRevisions).where(eq(pageRevisions.id, id));
  }

  async peopleByIds(ids: (string | null | undefined)[]): Promise<Map<string, PersonRef>> {
    const wanted = [...new Set(ids.filter((id): id is string => typeof id === 'string'))];
    if (wanted.length === 0) return new Map();
    const rows = await this.db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, wanted));
    return new Map(rows.map((row) => [row.id, row]));
  }

  async findUserIdByEmail(email: string, executor: Executor = this.db): Promise<string | undefined> {
    const [row] = await executor.select({ id: users.id }).from(users).where(eq(users.email, email.toLowerCase()));
    return row?.id;
  }

  async userExists(id: string, executor: Executor = this.db): Promise<boolean> {
    const [row] = await executor.select({ id: users.id }).from(users).where(eq(users.id, id));
    return row !== undefined;
  }
}
