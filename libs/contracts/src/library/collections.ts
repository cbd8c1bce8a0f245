import { z } from 'zod';

/** Short name of a collection used in addresses and filters, e.g. `design-rules`. */
export const collectionKeySchema = z
  .string({ message: 'Key is required' })
  .trim()
  .min(2, 'Key must be at least 2 characters')
  .max(40, 'Key must be at most 40 characters')
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'Use lower-case letters, digits and single hyphens, e.g. design-rules');

const collectionNameSchema = z.string({ message: 'Name is required' }).trim().min(1, 'Name is required').max(120, 'Name is too long');
const collectionDescriptionSchema = z.string().trim().max(2000, 'Description must be at most 2000 characters');

export const collectionSchema = z.object({
  id: z.string(),
  key: z.string(),
  name: z.string(),
  description: z.string(),
  /** Pages the caller can read: published ones for readers, all for authors and admins. */
  pageCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Collection = z.infer<typeof collectionSchema>;

export const collectionListSchema = z.object({ items: z.array(collectionSchema) });
export type CollectionList = z.infer<typeof collectionListSchema>;

export const createCollectionRequestSchema = z.strictObject({
  key: collectionKeySchema,
  name: collectionNameSchema,
  description: collectionDescriptionSchema.default(''),
});
export type CreateCollectionRequest = z.input<typeof createCollectionRequestSchema>;

/** The key stays as created: it appears in addresses people have bookmarked. */
export const updateCollectionRequestSchema = z
  .strictObject({
    name: collectionNameSchema.optional(),
    description: collectionDescriptionSchema.optional(),
  })
  .refine((body) => Object.keys(body).length > 0, { message: 'Nothing to change' });
export type UpdateCollectionRequest = z.infer<typeof updateCollectionRequestSchema>;

/** A collection as it appears inside a page or a search result. */
export const collectionRefSchema = z.object({ id: z.string(), key: z.string(), name: z.string() });
export type CollectionRef = z.infer<typeof collectionRefSchema>;
