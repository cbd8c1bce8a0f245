import { mkdtemp, mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { listCalculatorBlocks } from '@limitbook/editor-schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { workspaceRoot } from '../../../config/workspace-paths.js';
import { DemoContentError, listDemoStandardFiles, parseStandard, readDemoLibrary } from './demo-content.js';

const contentDir = join(workspaceRoot(), 'content');
const files = await listDemoStandardFiles(contentDir);

describe('demo standards in content/demo/standards', () => {
  it('are there to load', () => {
    expect(files.length).toBeGreaterThan(0);
  });

  it.each(files.map((path) => [basename(path), path]))('%s converts to a page body the server accepts', async (name, path) => {
    const standard = parseStandard(`content/demo/standards/${name}`, await readFile(path, 'utf8'));
    expect(standard.documentNumber).toMatch(/^[A-Z]/);
    expect(standard.content.searchText.length).toBeGreaterThan(100);
    for (const block of listCalculatorBlocks(standard.content.document)) expect(block.caption, `${name}: block ${block.blockId} has no caption`).not.toBe('');
  });

  it('load together: known collections, unique document numbers', async () => {
    const library = await readDemoLibrary(contentDir);
    expect(library.standards).toHaveLength(files.length);
    expect(library.collections.length).toBeGreaterThanOrEqual(3);
  });
});

describe('a broken demo file', () => {
  let dir: string;
  const good = (number: string) =>
    ['---', `documentNumber: ${number}`, 'title: A page', 'collection: design-rules', 'owner: idris.okafor@brackwater.example', 'tags: [wall]', '---', '# Purpose', '', 'Text.'].join('\n');

  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'limitbook-demo-content-'));
    await mkdir(join(dir, 'demo', 'standards'), { recursive: true });
    await writeFile(join(dir, 'demo', 'collections.json'), JSON.stringify({ collections: [{ key: 'design-rules', name: 'Design rules' }] }));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  async function failureOf(name: string, text: string): Promise<string> {
    const path = join(dir, 'demo', 'standards', name);
    await writeFile(path, text);
    try {
      await readDemoLibrary(dir);
      return 'loaded';
    } catch (error) {
      expect(error).toBeInstanceOf(DemoContentError);
      return (error as Error).message;
    } finally {
      await rm(path);
    }
  }

  it('fails naming the file and the path of a refused attribute', async () => {
    const body = good('BW-STD-900').replace('Text.', '```calculator\n{ "blockId": "5b0e7a52-8c1d-4f3e-9a6b-2c4d8e1f0a37", "method": "wall-thickness", "locked": ["positionTolerance"] }\n```');
    expect(await failureOf('bad-block.md', body)).toBe(
      `${basename(dir)}/demo/standards/bad-block.md: the page body is refused: document.content.1.attrs.locked.0: Locked input positionTolerance has no default value`,
    );
  });

  it('fails naming the file and line of bad Markdown, and bad front matter', async () => {
    expect(await failureOf('bad-json.md', good('BW-STD-901').replace('Text.', '```calculator\n{ oops\n```'))).toMatch(/bad-json\.md: line 10: Calculator block is not valid JSON/);
    expect(await failureOf('bad-meta.md', good('BW-STD-902').replace('collection: design-rules', 'collection: nowhere'))).toMatch(
      /bad-meta\.md: front matter: collection nowhere is not in .*collections\.json/,
    );
    expect(await failureOf('bad-key.md', good('BW-STD-903').replace('tags: [wall]', 'tags: [wall]\nstatus: released'))).toMatch(/bad-key\.md: front matter: .*status/);
    expect(await failureOf('no-meta.md', '# Just text')).toMatch(/no-meta\.md: must start with front matter/);
  });

  it('fails on a document number used twice', async () => {
    await writeFile(join(dir, 'demo', 'standards', 'a.md'), good('BW-STD-910'));
    expect(await failureOf('b.md', good('bw-std-910'))).toMatch(/b\.md: document number BW-STD-910 is already used by .*a\.md/);
    await rm(join(dir, 'demo', 'standards', 'a.md'));
  });
});
