import { Inject, Injectable } from '@nestjs/common';
import { type DesignDefinition, type PersonRef, type RevisionState, type Role } from '@limitbook/contracts';
import { and, asc, desc, eq, inArray, isNotNull, max, sql } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database, type Executor } from '../../database/database.js';
import {
  type MethodDesignRevisionRow,
  type MethodDesignRow,
  methodDesignRevisions,
  methodDesigns,
  type NewMethodDesignRevisionRow,
  pageRevisions,
  pages,
  users,
} from '../../database/schema/index.js';

export interface ReleasedMethod {
  design: MethodDesignRow;
  revision: MethodDesignRevisionRow;
}

/** A page revision that may hold calculator blocks of a method. */
export interface PageRevisionUsing {
  pageId: string;
  documentNumber: string;
  revisionId: string;
  title: string;
  state: RevisionState;
  revisionLetter: string | null;
  document: unknown;
}

const openStates: RevisionState[] = ['draft', 'in_review'];

/** The only file of the in-house methods that touches Drizzle. */
@Injectable()
export class MethodDesignsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  transaction<T>(work: (tx: Executor) => Promise<T>): Promise<T> {
    return this.db.transaction(work);
  }

  async findDesign(slug: string, executor: Executor = this.db): Promise<MethodDesignRow | undefined> {
    const [row] = await executor.select().from(methodDesigns).where(eq(methodDesigns.slug, slug));
    return row;
  }

  /** Locks the design's row: state changes of one method are serialised. */
  async lockDesign(slug: string, tx: Executor): Promise<MethodDesignRow | undefined> {
    const [row] = await tx.select().from(methodDesigns).where(eq(methodDesigns.slug, slug)).for('update');
    return row;
  }

  /** Undefined when the slug is taken. */
  async insertDesign(values: { slug: string; ownerId: string; createdBy: string | null }, tx: Executor): Promise<MethodDesignRow | undefined> {
    const [row] = await tx.insert(methodDesigns).values(values).onConflictDoNothing({ target: methodDesigns.slug }).returning();
    return row;
  }

  async touchDesign(id: string, tx: Executor): Promise<void> {
    await tx.update(methodDesigns).set({ updatedAt: new Date() }).where(eq(methodDesigns.id, id));
  }

  async deleteDesign(id: string, tx: Executor): Promise<void> {
    await tx.delete(methodDesigns).where(eq(methodDesigns.id, id));
  }

  async listDesigns(): Promise<MethodDesignRow[]> {
    return this.db.select().from(methodDesigns).orderBy(asc(methodDesigns.slug));
  }

  /** Released and open revisions of every design (superseded ones are history). */
  async currentRevisions(): Promise<MethodDesignRevisionRow[]> {
    return this.db
      .select()
      .from(methodDesignRevisions)
      .where(inArray(methodDesignRevisions.state, ['released', 'draft', 'in_review']));
  }

  async findOpen(designId: string, executor: Executor = this.db): Promise<MethodDesignRevisionRow | undefined> {
    const [row] = await executor
      .select()
      .from(methodDesignRevisions)
      .where(and(eq(methodDesignRevisions.designId, designId), inArray(methodDesignRevisions.state, openStates)));
    return row;
  }

  /** The latest release, or the given version (released or superseded). */
  async findReleased(designId: string, methodVersion: number | null, executor: Executor = this.db): Promise<MethodDesignRevisionRow | undefined> {
    const [row] = await executor
      .select()
      .from(methodDesignRevisions)
      .where(
        and(
          eq(methodDesignRevisions.designId, designId),
          methodVersion === null ? eq(methodDesignRevisions.state, 'released') : eq(methodDesignRevisions.methodVersion, methodVersion),
        ),
      );
    return row;
  }

  /** For evaluation: `house:<slug>` at a version (null: the latest release). */
  async findReleasedBySlug(slug: string, methodVersion: number | null): Promise<ReleasedMethod | undefined> {
    const [row] = await this.db
      .select({ design: methodDesigns, revision: methodDesignRevisions })
      .from(methodDesignRevisions)
      .innerJoin(methodDesigns, eq(methodDesigns.id, methodDesignRevisions.designId))
      .where(
        and(
          eq(methodDesigns.slug, slug),
          methodVersion === null ? eq(methodDesignRevisions.state, 'released') : eq(methodDesignRevisions.methodVersion, methodVersion),
          isNotNull(methodDesignRevisions.methodVersion),
        ),
      );
    return row;
  }

  /** The latest release of every in-house method, for the catalog. */
  async allReleased(): Promise<ReleasedMethod[]> {
    return this.db
      .select({ design: methodDesigns, revision: methodDesignRevisions })
      .from(methodDesignRevisions)
      .innerJoin(methodDesigns, eq(methodDesigns.id, methodDesignRevisions.designId))
      .where(eq(methodDesignRevisions.state, 'released'))
      .orderBy(asc(methodDesigns.slug));
  }

  async listRevisions(designId: string, states: RevisionState[]): Promise<MethodDesignRevisionRow[]> {
    return this.db
      .select()
      .from(methodDesignRevisions)
      .where(and(eq(methodDesignRevisions.designId, designId), inArray(methodDesignRevisions.state, states)))
      .orderBy(desc(sql`coalesce(${methodDesignRevisions.methodVersion}, 2147483647)`), desc(methodDesignRevisions.createdAt));
  }

  async maxMethodVersion(designId: string, tx: Executor): Promise<number> {
    const [row] = await tx.select({ value: max(methodDesignRevisions.methodVersion) }).from(methodDesignRevisions).where(eq(methodDesignRevisions.designId, designId));
    return row?.value ?? 0;
  }

  /** Undefined when another revision is already open (the one-open index). */
  async insertRevision(values: NewMethodDesignRevisionRow, tx: Executor): Promise<MethodDesignRevisionRow | undefined> {
    const [row] = await tx.insert(methodDesignRevisions).values(values).onConflictDoNothing().returning();
    return row;
  }

  /** A state change guarded by the state it leaves; undefined when the revision is no longer in it. */
  async transition(
    id: string,
    from: RevisionState,
    patch: Partial<Omit<NewMethodDesignRevisionRow, 'id' | 'designId' | 'definition'>>,
    tx: Executor,
  ): Promise<MethodDesignRevisionRow | undefined> {
    const [row] = await tx
      .update(methodDesignRevisions)
      .set(patch)
      .where(and(eq(methodDesignRevisions.id, id), eq(methodDesignRevisions.state, from)))
      .returning();
    return row;
  }

  /** Saves over `baseVersion` only; undefined when the draft moved on (or is no longer a draft). */
  async saveDraft(id: string, baseVersion: number, definition: DesignDefinition, userId: string, tx: Executor): Promise<MethodDesignRevisionRow | undefined> {
    const [row] = await tx
      .update(methodDesignRevisions)
      .set({ definition, version: baseVersion + 1, updatedBy: userId, updatedAt: new Date() })
      .where(and(eq(methodDesignRevisions.id, id), eq(methodDesignRevisions.state, 'draft'), eq(methodDesignRevisions.version, baseVersion)))
      .returning();
    return row;
  }

  async deleteRevision(id: string, tx: Executor): Promise<void> {
    await tx.delete(methodDesignRevisions).where(and(eq(methodDesignRevisions.id, id), eq(methodDesignRevisions.state, 'draft')));
  }

  async peopleByIds(ids: (string | null | undefined)[]): Promise<Map<string, PersonRef>> {
    const wanted = [...new Set(ids.filter((id): id is string => typeof id === 'string'))];
    if (wanted.length === 0) return new Map();
    const rows = await this.db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, wanted));
    return new Map(rows.map((row) => [row.id, row]));
  }

  async usersWithRoles(ids: string[]): Promise<{ id: string; email: string; name: string; role: Role; status: string }[]> {
    if (ids.length === 0) return [];
    return this.db.select({ id: users.id, email: users.email, name: users.name, role: users.role, status: users.status }).from(users).where(inArray(users.id, ids));
  }

  async findUserIdByEmail(email: string, executor: Executor = this.db): Promise<string | undefined> {
    const [row] = await executor.select({ id: users.id }).from(users).where(eq(users.email, email.toLowerCase()));
    return row?.id;
  }

  /**
   * Current page revisions (the released one of each page, and open drafts) whose body
   * mentions `methodId`; the caller reads the calculator blocks to be sure.
   */
  async pageRevisionsMentioning(methodId: string, states: RevisionState[]): Promise<PageRevisionUsing[]> {
    const needle = `%${methodId.replace(/[\\%_]/g, (character) => `\\${character}`)}%`;
    return this.db
      .select({
        pageId: pages.id,
        documentNumber: pages.documentNumber,
        revisionId: pageRevisions.id,
        title: pageRevisions.title,
        state: pageRevisions.state,
        revisionLetter: pageRevisions.revisionLetter,
        document: pageRevisions.document,
      })
      .from(pageRevisions)
      .innerJoin(pages, eq(pages.id, pageRevisions.pageId))
      .where(
        and(
          inArray(pageRevisions.state, states),
          sql`(${pageRevisions.state} <> 'released' or ${pages.currentPublishedRevisionId} = ${pageRevisions.id})`,
          sql`${pageRevisions.document}::text like ${needle}`,
        ),
      )
      .orderBy(asc(pages.documentNumber));
  }
}
