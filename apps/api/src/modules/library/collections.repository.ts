import { Inject, Injectable } from '@nestjs/common';
import { asc, eq, sql } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database, type Executor } from '../../database/database.js';
import { type CollectionRow, collections, type NewCollectionRow, pages } from '../../database/schema/index.js';
import { isUniqueViolation } from './unique-violation.js';

export interface CollectionWithCount {
  collection: CollectionRow;
  pageCount: number;
}

@Injectable()
export class CollectionsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /** Each collection with the number of its pages; `publishedOnly` counts only pages readers can open. */
  async list(publishedOnly: boolean): Promise<CollectionWithCount[]> {
    const pageCount = publishedOnly
      ? sql<number>`cast(count(${pages.id}) filter (where ${pages.currentPublishedRevisionId} is not null) as int)`
      : sql<number>`cast(count(${pages.id}) as int)`;
    const rows = await this.db
      .select({ collection: collections, pageCount })
      .from(collections)
      .leftJoin(pages, eq(pages.collectionId, collections.id))
      .groupBy(collections.id)
      .orderBy(asc(collections.name));
    return rows;
  }

  async findById(id: string, executor: Executor = this.db): Promise<CollectionRow | undefined> {
    const [row] = await executor.select().from(collections).where(eq(collections.id, id));
    return row;
  }

  async findByKey(key: string, executor: Executor = this.db): Promise<CollectionRow | undefined> {
    const [row] = await executor.select().from(collections).where(eq(collections.key, key));
    return row;
  }

  /** Undefined when the key is taken. */
  async insert(values: NewCollectionRow, executor: Executor = this.db): Promise<CollectionRow | undefined> {
    try {
      const [row] = await executor.insert(collections).values(values).returning();
      return row;
    } catch (error) {
      if (isUniqueViolation(error)) return undefined;
      throw error;
    }
  }

  async update(id: string, changes: Partial<Pick<CollectionRow, 'name' | 'description'>>, executor: Executor = this.db): Promise<CollectionRow | undefined> {
    const [row] = await executor
      .update(collections)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(collections.id, id))
      .returning();
    return row;
  }

  async countPages(id: string, executor: Executor = this.db): Promise<number> {
    const [row] = await executor.select({ n: sql<number>`cast(count(*) as int)` }).from(pages).where(eq(pages.collectionId, id));
    return row?.n ?? 0;
  }

  async delete(id: string, executor: Executor = this.db): Promise<void> {
    await executor.delete(collections).where(eq(collections.id, id));
  }
}
