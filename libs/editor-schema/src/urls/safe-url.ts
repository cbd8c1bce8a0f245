const ownFileSrcPattern = /^\/api\/files\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const absoluteWebUrlPattern = /^https?:\/\/[^\s/?#]+/i;
const mailtoPattern = /^mailto:[^\s]+$/i;
// Characters that never belong in a stored URL: controls, invisible format characters,
// whitespace, quotes, angle brackets and backslashes.
const forbiddenUrlCharacters = /[\p{Cc}\p{Cf}\p{Z}\s"'<>`\\]/u;
// Numeric references decode without a semicolon; named ones in attributes only with one.
const characterReference = /&#(\d|x[0-9a-f])|&[a-z][a-z0-9]*;/i;

/** Longest URL accepted in a link or an image. */
export const maxUrlLength = 2048;

function isCleanUrl(url: string): boolean {
  return url.length > 0 && url.length <= maxUrlLength && !forbiddenUrlCharacters.test(url);
}

// A path on this site: `/…` but never `//host` (another origin), and with no character
// references that a later HTML serialisation could decode into a scheme or a second slash.
function isSitePath(url: string): boolean {
  return url.startsWith('/') && !url.startsWith('//') && !characterReference.test(url);
}

/**
 * Whether `url` may be stored as a link target: `http(s)://…`, `mailto:…`, a path on this
 * site (`/…`) or a fragment (`#…`). Everything else is refused, including `javascript:`,
 * `data:` and `vbscript:` in any case, with embedded whitespace or as character references.
 */
export function isSafeHref(url: unknown): url is string {
  if (typeof url !== 'string' || !isCleanUrl(url)) return false;
  if (url.startsWith('#')) return !characterReference.test(url);
  return absoluteWebUrlPattern.test(url) || mailtoPattern.test(url) || isSitePath(url);
}

/**
 * Whether `src` may be stored as an image source: one of our uploaded files
 * (`/api/files/<uuid>`) or an `http(s)://` address. `data:` and every other scheme are refused.
 */
export function isSafeImageSrc(src: unknown): src is string {
  if (typeof src !== 'string' || !isCleanUrl(src)) return false;
  return ownFileSrcPattern.test(src) || absoluteWebUrlPattern.test(src);
}

/** The address at which an uploaded file is served. */
export function fileUrl(fileId: string): string {
  return `/api/files/${fileId}`;
}
