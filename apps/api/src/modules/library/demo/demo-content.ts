import { readdir, readFile } from 'node:fs/promises';
import { dirname, join, relative } from 'node:path';
import { collectionKeySchema, documentNumberSchema, pageTagsSchema, pageTitleSchema } from '@limitbook/contracts';
import { MarkdownConversionError, markdownToDocument } from '@limitbook/editor-schema/markdown';
import { parse as parseYaml } from 'yaml';
import { z } from 'zod';
import { type PageContent, preparePageContent } from '../page-content.js';

/** A demo content file that cannot be loaded; the message names the file and the place in it. */
export class DemoContentError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'DemoContentError';
  }
}

const collectionsFileSchema = z.strictObject({
  collections: z
    .array(
      z.strictObject({
        key: collectionKeySchema,
        name: z.string().trim().min(1).max(120),
        description: z.string().trim().max(2000).default(''),
      }),
    )
    .min(1),
});

const frontMatterSchema = z.strictObject({
  documentNumber: documentNumberSchema,
  title: pageTitleSchema,
  collection: collectionKeySchema,
  owner: z.email({ message: 'Owner must be an e-mail address' }).transform((value) => value.toLowerCase()),
  tags: pageTagsSchema.default([]),
});

export interface DemoCollection {
  key: string;
  name: string;
  description: string;
}

export interface DemoStandard {
  /** Path relative to the content folder, for messages. */
  file: string;
  documentNumber: string;
  title: string;
  collection: string;
  owner: string;
  tags: string[];
  content: PageContent;
}

export interface DemoLibrary {
  collections: DemoCollection[];
  standards: DemoStandard[];
}

function issuesText(error: z.ZodError): string {
  return error.issues.map((issue) => `${issue.path.join('.') || '(file)'}: ${issue.message}`).join('; ');
}

/** Splits `---` front matter from the Markdown body; `bodyLine` is the 0-based line where the body starts. */
function splitFrontMatter(text: string): { frontMatter: string; body: string; bodyLine: number } | undefined {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  if (lines[0]?.trim() !== '---') return undefined;
  const end = lines.findIndex((line, index) => index > 0 && line.trim() === '---');
  if (end === -1) return undefined;
  return { frontMatter: lines.slice(1, end).join('\n'), body: lines.slice(end + 1).join('\n'), bodyLine: end + 1 };
}

/** Reads one standard: front matter, Markdown body converted to a page body and checked like any save. */
export function parseStandard(file: string, text: string): DemoStandard {
  const parts = splitFrontMatter(text);
  if (!parts) throw new DemoContentError(`${file}: must start with front matter between two --- lines`);
  let raw: unknown;
  try {
    raw = parseYaml(parts.frontMatter);
  } catch (error) {
    throw new DemoContentError(`${file}: front matter is not valid YAML: ${error instanceof Error ? error.message : String(error)}`);
  }
  const meta = frontMatterSchema.safeParse(raw);
  if (!meta.success) throw new DemoContentError(`${file}: front matter: ${issuesText(meta.error)}`);
  let document;
  try {
    document = markdownToDocument(parts.body, { lineOffset: parts.bodyLine });
  } catch (error) {
    if (error instanceof MarkdownConversionError) throw new DemoContentError(`${file}: ${error.message}`);
    throw error;
  }
  const prepared = preparePageContent(document);
  if (!prepared.ok) {
    const problems = Object.entries(prepared.fields).map(([path, message]) => `${path}: ${message}`);
    throw new DemoContentError(`${file}: the page body is refused: ${problems.join('; ')}`);
  }
  return { file, ...meta.data, content: prepared.content };
}

async function readText(path: string, shown: string): Promise<string> {
  try {
    return await readFile(path, 'utf8');
  } catch (error) {
    throw new DemoContentError(`${shown}: cannot be read: ${String(error)}`);
  }
}

export function demoStandardsDir(contentDir: string): string {
  return join(contentDir, 'demo', 'standards');
}

export async function listDemoStandardFiles(contentDir: string): Promise<string[]> {
  const dir = demoStandardsDir(contentDir);
  const names = await readdir(dir).catch((error: NodeJS.ErrnoException) => {
    if (error.code === 'ENOENT') return [] as string[];
    throw error;
  });
  return names
    .filter((name) => name.endsWith('.md'))
    .sort()
    .map((name) => join(dir, name));
}

/**
 * Reads and checks the whole demo library before anything is written: every collection,
 * every standard, document numbers unique and collections known. Throws DemoContentError
 * naming the file at the first problem.
 */
export async function readDemoLibrary(contentDir: string): Promise<DemoLibrary> {
  const collectionsPath = join(contentDir, 'demo', 'collections.json');
  // Messages name files from the folder holding the content folder: content/demo/standards/….
  const shown = (path: string) => relative(dirname(contentDir), path);
  const shownCollections = shown(collectionsPath);
  let rawCollections: unknown;
  try {
    rawCollections = JSON.parse(await readText(collectionsPath, shownCollections));
  } catch (error) {
    if (error instanceof DemoContentError) throw error;
    throw new DemoContentError(`${shownCollections}: not valid JSON: ${error instanceof Error ? error.message : String(error)}`);
  }
  const collections = collectionsFileSchema.safeParse(rawCollections);
  if (!collections.success) throw new DemoContentError(`${shownCollections}: ${issuesText(collections.error)}`);
  const keys = new Set(collections.data.collections.map((collection) => collection.key));

  const standards: DemoStandard[] = [];
  const numbers = new Map<string, string>();
  for (const path of await listDemoStandardFiles(contentDir)) {
    const file = shown(path);
    const standard = parseStandard(file, await readText(path, file));
    if (!keys.has(standard.collection)) throw new DemoContentError(`${file}: front matter: collection ${standard.collection} is not in ${shownCollections}`);
    const other = numbers.get(standard.documentNumber);
    if (other) throw new DemoContentError(`${file}: document number ${standard.documentNumber} is already used by ${other}`);
    numbers.set(standard.documentNumber, file);
    standards.push(standard);
  }
  return { collections: collections.data.collections, standards };
}
