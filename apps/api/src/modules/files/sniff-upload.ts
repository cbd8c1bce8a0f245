import { extname } from 'node:path';
import { type UploadContentType, uploadTypes } from '@limitbook/contracts';
import { fileTypeFromBuffer } from 'file-type';
import Papa from 'papaparse';

export type SniffResult = { ok: true; contentType: UploadContentType } | { ok: false; message: string };

const accepted = 'PNG, JPEG, GIF or WebP images, PDF documents and CSV tables';
const labels: Record<UploadContentType, string> = {
  'image/png': 'a PNG image',
  'image/jpeg': 'a JPEG image',
  'image/gif': 'a GIF image',
  'image/webp': 'a WebP image',
  'application/pdf': 'a PDF document',
  'text/csv': 'a CSV table',
};

function typeForExtension(extension: string) {
  return uploadTypes.find((type) => (type.extensions as readonly string[]).includes(extension));
}

/** CSV has no signature: it must be UTF-8 text without NUL bytes, not markup, and parse as CSV. */
function csvProblem(bytes: Buffer): string | null {
  if (bytes.includes(0)) return 'it holds binary data';
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return 'it is not UTF-8 text';
  }
  const body = text.replace(/^\uFEFF/, '').trimStart();
  if (body === '') return 'it is empty';
  if (body.startsWith('<')) return 'it looks like HTML or XML';
  const parsed = Papa.parse<string[]>(body, { skipEmptyLines: true, delimitersToGuess: [',', ';', '\t'] });
  const error = parsed.errors.find((entry) => entry.type !== 'Delimiter');
  if (error) return `row ${(error.row ?? 0) + 1}: ${error.message}`;
  if (parsed.data.length === 0) return 'it has no rows';
  return null;
}

/**
 * Decides what an upload is from its bytes. The name's extension must agree with them: a
 * `.png` holding HTML, or a `.pdf` holding a PNG, is refused rather than stored under the
 * wrong type. Anything outside the accepted types (SVG, HTML, executables…) is refused.
 */
export async function sniffUpload(name: string, bytes: Buffer): Promise<SniffResult> {
  const extension = extname(name).slice(1).toLowerCase();
  const named = typeForExtension(extension);
  const detected = await fileTypeFromBuffer(bytes);
  if (detected) {
    const type = uploadTypes.find((entry) => entry.contentType === detected.mime);
    if (!type) return { ok: false, message: `${name} holds ${detected.mime} data. Limitbook accepts ${accepted}.` };
    if (extension !== '' && named?.contentType !== type.contentType) {
      return { ok: false, message: `${name} is named .${extension} but holds ${labels[type.contentType]}. Rename it to .${type.extensions[0]} or upload the right file.` };
    }
    return { ok: true, contentType: type.contentType };
  }
  if (named?.contentType === 'text/csv') {
    const problem = csvProblem(bytes);
    if (problem) return { ok: false, message: `${name} is not a CSV table: ${problem}.` };
    return { ok: true, contentType: 'text/csv' };
  }
  if (named) return { ok: false, message: `${name} is named .${extension} but its bytes are not ${labels[named.contentType]}.` };
  return { ok: false, message: `${name} is not a file type Limitbook accepts: upload ${accepted}.` };
}
