import { Inject, Injectable } from '@nestjs/common';
import { type PersonRef, type RevisionState, type Role } from '@limitbook/contracts';
import { and, arrayContains, asc, desc, eq, inArray, isNotNull, isNull, type SQL, sql } from 'drizzle-orm';
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
  pageWatches,
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
  revisionLetter: string | null;
}

export interface PageListFilter {
  collectionKey?: string;
  tag?: string;
  /** Readers: only pages with a published revision, ordered by publication. */
  publishedOnly: boolean;
  includeObsolete: boolean;
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
  /** For a revision inserted released (demo content): its letter. */
  revisionLetter?: string;
  restoredFromId?: string;
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
    if (!filter.includeObsolete) conditions.push(isNull(pages.obsoleteAt));
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
          revisionLetter: publishedRevision.revisionLetter,
          hasDraft: sql<boolean>`${draftRevision.id} is not null`,
        })
        .from(pages)
        .innerJoin(collections, eq(collections.id, pages.collectionId))
        .leftJoin(publishedRevision, eq(publishedRevision.id, pages.currentPublishedRevisionId))
        .leftJoin(draftRevision, and(eq(draftRevision.pageId, pages.id), inArray(draftRevision.state, ['draft', 'in_review'])))
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
      .where(and(isNull(pages.obsoleteAt), publishedOnly ? isNotNull(pages.currentPublishedRevisionId) : undefined))
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

  async updatePage(
    id: string,
    changes: Partial<Pick<PageRow, 'collectionId' | 'tags' | 'ownerId' | 'currentPublishedRevisionId' | 'obsoleteAt' | 'obsoleteBy' | 'obsoleteReason'>>, executor: Executor = this.db): Promise<PageRow> {
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

  /** The open revision: the draft, or the same revision while it is in review. */
  async findDraft(pageId: string, executor: Executor = this.db): Promise<PageRevisionRow | undefined> {
    const [row] = await executor
      .select()
      .from(pageRevisions)
      .where(and(eq(pageRevisions.pageId, pageId), inArray(pageRevisions.state, ['draft', 'in_review'])));
    return row;
  }

  /** Newest first. */
  async listRevisions(pageId: string, states: RevisionState[], executor: Executor = this.db): Promise<PageRevisionRow[]> {
    return executor
      .select()
      .from(pageRevisions)
      .where(and(eq(pageRevisions.pageId, pageId), inArray(pageRevisions.state, states)))
      .orderBy(desc(pageRevisions.sequence));
  }

  /**
   * Moves a revision from one state to the next, only if it is still in `from`: a revision that
   * moved meanwhile (or a released one) is never touched. Undefined when nothing matched.
   */
  async transition(
    revisionId: string,
    from: RevisionState,
    changes: Partial<
      Pick<
        PageRevisionRow,
        'state' | 'revisionLetter' | 'publishedAt' | 'publishedBy' | 'submittedAt' | 'submittedBy' | 'reviewerIds' | 'submitNote' | 'reviewComment' | 'supersededAt'
      >
    >,
    executor: Executor = this.db,
  ): Promise<PageRevisionRow | undefined> {
    const [row] = await executor
      .update(pageRevisions)
      .set({ ...changes, updatedAt: new Date() })
      .where(and(eq(pageRevisions.id, revisionId), eq(pageRevisions.state, from)))
      .returning();
    return row;
  }

  async usersWithRoles(ids: string[], executor: Executor = this.db): Promise<{ id: string; name: string; email: string; role: Role; status: string }[]> {
    if (ids.length === 0) return [];
    return executor.select({ id: users.id, name: users.name, email: users.email, role: users.role, status: users.status }).from(users).where(inArray(users.id, ids));
  }

  async watch(pageId: string, userId: string): Promise<void> {
    await this.db.insert(pageWatches).values({ pageId, userId }).onConflictDoNothing();
  }

  async unwatch(pageId: string, userId: string): Promise<void> {
    await this.db.delete(pageWatches).where(and(eq(pageWatches.pageId, pageId), eq(pageWatches.userId, userId)));
  }

  async isWatching(pageId: string, userId: string): Promise<boolean> {
    const [row] = await this.db
      .select({ pageId: pageWatches.pageId })
      .from(pageWatches)
      .where(and(eq(pageWatches.pageId, pageId), eq(pageWatches.userId, userId)));
    return row !== undefined;
  }

  /** Active watchers of a page, for release notices. */
  async watchers(pageId: string, executor: Executor = this.db): Promise<{ id: string; name: string; email: string }[]> {
    return executor
      .select({ id: users.id, name: users.name, email: users.email })
      .from(pageWatches)
      .innerJoin(users, eq(users.id, pageWatches.userId))
      .where(and(eq(pageWatches.pageId, pageId), eq(users.status, 'active')));
  }

  async watchedPages(userId: string) {
    return this.db
      .select({
        page: pages,
        collection: collections,
        watchedAt: pageWatches.createdAt,
        title: sql<string>`coalesce(${publishedRevision.title}, ${draftRevision.title}, '')`,
        revisionLetter: publishedRevision.revisionLetter,
        releasedAt: publishedRevision.publishedAt,
      })
      .from(pageWatches)
      .innerJoin(pages, eq(pages.id, pageWatches.pageId))
      .innerJoin(collections, eq(collections.id, pages.collectionId))
      .leftJoin(publishedRevision, eq(publishedRevision.id, pages.currentPublishedRevisionId))
      .leftJoin(draftRevision, and(eq(draftRevision.pageId, pages.id), inArray(draftRevision.state, ['draft', 'in_review'])))
      .where(eq(pageWatches.userId, userId))
      .orderBy(asc(pages.documentNumber));
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
          restoredFromId: revision.restoredFromId ?? null,
          ...(revision.state === 'released' ? { publishedAt: now, publishedBy: revision.userId, revisionLetter: revision.revisionLetter ?? null } : {}),
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
