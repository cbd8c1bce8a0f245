import { z } from 'zod';
import { personRefSchema } from './pages.js';

export const maxUploadBytes = 10 * 1024 * 1024;

/** What an upload may hold, told apart by its bytes rather than its name. */
export const uploadTypes = [
  { contentType: 'image/png', extensions: ['png'] },
  { contentType: 'image/jpeg', extensions: ['jpg', 'jpeg'] },
  { contentType: 'image/gif', extensions: ['gif'] },
  { contentType: 'image/webp', extensions: ['webp'] },
  { contentType: 'application/pdf', extensions: ['pdf'] },
  { contentType: 'text/csv', extensions: ['csv'] },
] as const;
export type UploadContentType = (typeof uploadTypes)[number]['contentType'];

export const storedFileSchema = z.object({
  id: z.string(),
  name: z.string(),
  contentType: z.string(),
  size: z.number().int(),
  sha256: z.string(),
  /** Where the file is served to a bearer token; also what an image node's `src` or an attachment refers to. */
  url: z.string(),
  /** The same file for `<img>` and download links, which send no token: bound to the uploader, valid for an hour or more. */
  signedUrl: z.string(),
  uploadedBy: personRefSchema.nullable(),
  createdAt: z.string(),
});
export type StoredFile = z.infer<typeof storedFileSchema>;

const downloadFlagSchema = z.enum(['0', '1'], { message: 'Use download=1 to save the file instead of opening it' }).optional();

export const fileQuerySchema = z.strictObject({ download: downloadFlagSchema });
export type FileQuery = z.infer<typeof fileQuerySchema>;

/** The query of a signed file address, as issued in `signedUrl` and a page's `fileUrls`. */
export const signedFileQuerySchema = z.strictObject({
  u: z.uuid({ message: 'Must be a valid id' }),
  exp: z.coerce.number({ message: 'Must be a time' }).int().positive(),
  sig: z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'Not a signature'),
  download: downloadFlagSchema,
});
export type SignedFileQuery = z.infer<typeof signedFileQuerySchema>;
