import { extractText, listCalculatorBlocks, validateDocument, type LimitbookDocument } from '@limitbook/editor-schema';

/** Marks ts_headline puts around matches; private-use characters, so page text never holds them. */
export const highlightStart = '\uE000';
export const highlightEnd = '\uE001';
const markerPattern = /[\uE000\uE001]/g;

export interface PageContent {
  /** The body as ProseMirror normalised it (attribute defaults filled in). */
  document: LimitbookDocument;
  searchText: string;
  searchCaptions: string;
}

export type PreparedContent = { ok: true; content: PageContent } | { ok: false; fields: Record<string, string> };

/**
 * Checks a page body against the editor's schema and derives what search needs from it.
 * Problems come back one message per path, under `document`, e.g. `document.content.3.attrs.href`.
 */
export function preparePageContent(json: unknown): PreparedContent {
  const result = validateDocument(json);
  if (!result.ok) {
    const fields: Record<string, string> = {};
    for (const error of result.errors) {
      const key = error.path === '' ? 'document' : `document.${error.path}`;
      fields[key] ??= error.message;
    }
    return { ok: false, fields };
  }
  const doc = result.doc;
  return {
    ok: true,
    content: {
      document: doc,
      searchText: extractText(doc).replace(markerPattern, ''),
      searchCaptions: listCalculatorBlocks(doc)
        .map((block) => block.caption.trim())
        .filter((caption) => caption !== '')
        .join('\n')
        .replace(markerPattern, ''),
    },
  };
}

/** An empty page, for a draft created without a body. */
export function emptyDocument(): LimitbookDocument {
  return { type: 'doc', content: [{ type: 'paragraph' }] };
}

interface NodeJson {
  type?: string;
  attrs?: Record<string, unknown>;
  content?: NodeJson[];
}

const ownFileSrc = /^\/api\/files\/([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})$/i;

/** Ids of uploaded files a page uses: image sources on our file storage and attachments. */
export function referencedFileIds(doc: LimitbookDocument): string[] {
  const ids = new Set<string>();
  const stack: NodeJson[] = [doc as NodeJson];
  while (stack.length > 0) {
    const node = stack.pop()!;
    if (node.type === 'image' && typeof node.attrs?.src === 'string') {
      const match = ownFileSrc.exec(node.attrs.src);
      if (match) ids.add(match[1]!.toLowerCase());
    }
    if (node.type === 'attachment' && typeof node.attrs?.fileId === 'string') ids.add(node.attrs.fileId.toLowerCase());
    for (const child of node.content ?? []) stack.push(child);
  }
  return [...ids];
}
