import { Inject, Injectable } from '@nestjs/common';
import { sql, type SQL } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database } from '../../database/database.js';
import { highlightEnd, highlightStart } from '../library/page-content.js';

export interface SearchFilter {
  text: string;
  /** Upper-case beginning of a document number to match as a prefix, when the text looks like one. */
  numberPrefix: string | null;
  collectionKey?: string;
  tag?: string;
  limit: number;
  offset: number;
}

export interface SearchRow {
  pageId: string;
  documentNumber: string;
  tags: string[];
  collectionId: string;
  collectionKey: string;
  collectionName: string;
  title: string;
  publishedAt: Date;
  numberMatch: boolean;
  rank: number;
  markedTitle: string;
  markedSnippet: string;
  total: number;
}

const snippetOptions = `StartSel=${highlightStart}, StopSel=${highlightEnd}, MaxWords=30, MinWords=12, MaxFragments=2, FragmentDelimiter=" … "`;
const titleOptions = `StartSel=${highlightStart}, StopSel=${highlightEnd}, HighlightAll=true`;

@Injectable()
export class SearchRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /**
   * Published revisions only. Order: document-number matches, then pages whose number or
   * title (weight A) holds the words, then ts_rank. The GIN index on search_vector finds the
   * matches; snippets are cut only for the rows of the requested page of results.
   */
  async search(filter: SearchFilter): Promise<SearchRow[]> {
    const conditions: SQL[] = [];
    if (filter.collectionKey) conditions.push(sql`c.key = ${filter.collectionKey}`);
    if (filter.tag) conditions.push(sql`p.tags @> array[${filter.tag}]::text[]`);
    const filters = conditions.length > 0 ? sql` and ${sql.join(conditions, sql` and `)}` : sql``;
    const numberMatch = filter.numberPrefix ? sql`p.document_number like ${`${filter.numberPrefix}%`}` : sql`false`;
    // Both drivers (PGlite and node-postgres) answer raw SQL with `{ rows }`.
    const result = (await this.db.execute(sql`
      with q as (select websearch_to_tsquery('english', ${filter.text}) as query),
      matches as (
        select p.id as page_id, p.document_number, p.tags, c.id as collection_id, c.key as collection_key, c.name as collection_name,
               r.title, r.search_text, r.published_at,
               ${numberMatch} as number_match,
               ts_filter(r.search_vector, '{a}') @@ q.query as heading_match,
               ts_rank(r.search_vector, q.query) as rank
        from pages p
        join page_revisions r on r.id = p.current_published_revision_id
        join collections c on c.id = p.collection_id
        cross join q
        where (r.search_vector @@ q.query or ${numberMatch})${filters}
      ),
      ranked as (
        select *, cast(count(*) over () as int) as total from matches
        order by number_match desc, heading_match desc, rank desc, document_number
        limit ${filter.limit} offset ${filter.offset}
      )
      select ranked.*,
             ts_headline('english', ranked.title, q.query, ${titleOptions}) as marked_title,
             ts_headline('english', ranked.search_text, q.query, ${snippetOptions}) as marked_snippet
      from ranked cross join q
      order by number_match desc, heading_match desc, rank desc, document_number`)) as { rows: Record<string, unknown>[] };
    return result.rows.map((row) => ({
      pageId: String(row.page_id),
      documentNumber: String(row.document_number),
      tags: row.tags as string[],
      collectionId: String(row.collection_id),
      collectionKey: String(row.collection_key),
      collectionName: String(row.collection_name),
      title: String(row.title),
      publishedAt: new Date(row.published_at as string | Date),
      numberMatch: Boolean(row.number_match),
      rank: Number(row.rank),
      markedTitle: String(row.marked_title),
      markedSnippet: String(row.marked_snippet),
      total: Number(row.total),
    }));
  }
}
