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

  async search(filter: SearchFilter): Promise<SearchRow[]> {
    // Both drivers (PGlite and node-postgres) answer raw SQL with `{ rows }`.
    const result = (await this.db.execute(searchQuery(filter))) as { rows: Record<string, unknown>[] };
    return result.rows.map(toSearchRow);
  }
}

/**
 * Published revisions only. Order: document-number matches, then pages whose number or
 * title (weight A) holds the words, then ts_rank.
 */
export function searchQuery(filter: SearchFilter): SQL {
  // Obsolete pages stay readable by link but drop out of search.
  const conditions: SQL[] = [sql`p.obsolete_at is null`];
  if (filter.collectionKey) conditions.push(sql`p.collection_id = (select id from collections where key = ${filter.collectionKey})`);
  if (filter.tag) conditions.push(sql`p.tags @> array[${filter.tag}]::text[]`);
  const filters = sql` and ${sql.join(conditions, sql` and `)}`;
  const prefix = filter.numberPrefix ? `${filter.numberPrefix}%` : null;
  // The tsquery is written out where it filters, not read from the CTE, so the planner can use
  // the GIN index. Two index lookups (GIN on the vectors, btree prefix on numbers) instead of one OR that
  // forces a scan; only current published revisions survive the join. Titles, page text and
  // snippets are read for the requested rows only: detoasting the text of every match is what costs.
  const numberCandidates = prefix
    ? sql`union select current_published_revision_id from pages where document_number like ${prefix} and current_published_revision_id is not null`
    : sql``;
  const numberMatch = prefix ? sql`p.document_number like ${prefix}` : sql`false`;
  return sql`
    with q as (select websearch_to_tsquery('english', ${filter.text}) as query),
    candidates as (
      select r.id as revision_id from page_revisions r where r.search_vector @@ websearch_to_tsquery('english', ${filter.text})
      ${numberCandidates}
    ),
    matches as (
      select p.id as page_id, r.id as revision_id, p.document_number,
             ${numberMatch} as number_match,
             ts_filter(r.search_vector, '{a}') @@ q.query as heading_match,
             ts_rank(r.search_vector, q.query) as rank
      from candidates
      join pages p on p.current_published_revision_id = candidates.revision_id
      join page_revisions r on r.id = candidates.revision_id
      cross join q
      where true${filters}
    ),
    ranked as (
      select *, cast(count(*) over () as int) as total from matches
      order by number_match desc, heading_match desc, rank desc, document_number
      limit ${filter.limit} offset ${filter.offset}
    )
    select ranked.*, p.tags, c.id as collection_id, c.key as collection_key, c.name as collection_name, r.title, r.published_at,
           ts_headline('english', r.title, q.query, ${titleOptions}) as marked_title,
           ts_headline('english', r.search_text, q.query, ${snippetOptions}) as marked_snippet
    from ranked
    join pages p on p.id = ranked.page_id
    join page_revisions r on r.id = ranked.revision_id
    join collections c on c.id = p.collection_id
    cross join q
    order by ranked.number_match desc, ranked.heading_match desc, ranked.rank desc, ranked.document_number`;
}

function toSearchRow(row: Record<string, unknown>): SearchRow {
  return {
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
  };
}
