import { Injectable } from '@nestjs/common';
import { type SearchQuery, type SearchResponse } from '@limitbook/contracts';
import { markedToRanges } from './highlights.js';
import { SearchRepository } from './search.repository.js';

// Letters first, then letters, digits and hyphens: `BW`, `bw-std-1`, `BW-STD-112`.
const documentNumberLike = /^[A-Za-z][A-Za-z0-9]*(-[A-Za-z0-9]*)*$/;

@Injectable()
export class SearchService {
  constructor(private readonly repository: SearchRepository) {}

  /** Full-text search over what readers may read: the published revision of each page. */
  async search(query: SearchQuery): Promise<SearchResponse> {
    const text = query.q.trim();
    const rows = await this.repository.search({
      text,
      numberPrefix: documentNumberLike.test(text) && text.length >= 2 ? text.toUpperCase() : null,
      collectionKey: query.collection,
      tag: query.tag,
      limit: query.limit,
      offset: query.offset,
    });
    return {
      total: rows[0]?.total ?? 0,
      items: rows.map((row) => {
        const title = markedToRanges(row.markedTitle);
        const snippet = markedToRanges(row.markedSnippet);
        return {
          pageId: row.pageId,
          documentNumber: row.documentNumber,
          title: title.text,
          titleHighlights: title.ranges,
          snippet: snippet.text,
          highlights: snippet.ranges,
          collection: { id: row.collectionId, key: row.collectionKey, name: row.collectionName },
          tags: row.tags,
          publishedAt: row.publishedAt.toISOString(),
          numberMatch: row.numberMatch,
          rank: row.rank,
        };
      }),
    };
  }
}
