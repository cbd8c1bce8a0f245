import { z } from 'zod';
import { collectionKeySchema, collectionRefSchema } from './collections.js';
import { pageTagSchema } from './pages.js';

export const searchQuerySchema = z.strictObject({
  /** Words, "quoted phrases", -excluded words, or a document number or its beginning (`BW-STD-1`). */
  q: z.string({ message: 'Type something to search for' }).trim().min(1, 'Type something to search for').max(200, 'Search text must be at most 200 characters'),
  collection: collectionKeySchema.optional(),
  tag: pageTagSchema.optional(),
  limit: z.coerce.number().int().min(1).max(50).default(20),
  offset: z.coerce.number().int().min(0).max(10_000).default(0),
});
export type SearchQuery = z.infer<typeof searchQuerySchema>;

/** A matched stretch of text: `text.slice(start, end)`, in UTF-16 code units as JavaScript counts them. */
export const textRangeSchema = z.object({ start: z.number().int(), end: z.number().int() });
export type TextRange = z.infer<typeof textRangeSchema>;

export const searchHitSchema = z.object({
  pageId: z.string(),
  documentNumber: z.string(),
  title: z.string(),
  titleHighlights: z.array(textRangeSchema),
  /** Plain text around the matches (never HTML); render `highlights` as marked ranges. */
  snippet: z.string(),
  highlights: z.array(textRangeSchema),
  collection: collectionRefSchema,
  tags: z.array(z.string()),
  publishedAt: z.string(),
  /** Whether the document number itself matched (these come first). */
  numberMatch: z.boolean(),
  rank: z.number(),
});
export type SearchHit = z.infer<typeof searchHitSchema>;

export const searchResponseSchema = z.object({ items: z.array(searchHitSchema), total: z.number().int() });
export type SearchResponse = z.infer<typeof searchResponseSchema>;
