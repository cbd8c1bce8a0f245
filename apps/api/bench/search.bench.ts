// Search latency over 5,000 generated published pages on in-memory PGlite, through the real
// repositories (same SQL, same GIN index as the server). Run: npx tsx apps/api/bench/search.bench.ts
// BENCH_PAGES changes the page count.
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { wrapPglite } from '../src/database/database.js';
import { collections } from '../src/database/schema/index.js';
import { preparePageContent } from '../src/modules/library/page-content.js';
import { PagesRepository } from '../src/modules/library/pages.repository.js';
import { SearchRepository } from '../src/modules/search/search.repository.js';
import { SearchService } from '../src/modules/search/search.service.js';

const here = dirname(fileURLToPath(import.meta.url));
const pageCount = Number(process.env.BENCH_PAGES ?? 5000);
const runs = 30;

const trade = [
  'wall', 'bore', 'port', 'position', 'tolerance', 'datum', 'boss', 'flange', 'bolt', 'pattern', 'clearance', 'fit', 'shaft', 'hole', 'bearing',
  'seat', 'dowel', 'pin', 'spool', 'valve', 'housing', 'pump', 'cover', 'gauge', 'inspection', 'stack', 'gap', 'end', 'play', 'thread',
  'chamfer', 'surface', 'finish', 'runout', 'flatness', 'perpendicularity', 'virtual', 'condition', 'bonus', 'shift', 'minimum', 'maximum',
];
// A seeded generator, so every run measures the same library.
let seed = 20261202;
const random = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
const pick = <T>(items: readonly T[]) => items[Math.floor(random() * items.length)]!;
const filler = Array.from({ length: 3000 }, (_, index) => `w${index.toString(36)}x${(index * 7919).toString(36)}`);
const sentence = (words: number) => Array.from({ length: words }, () => (random() < 0.3 ? pick(trade) : pick(filler))).join(' ');

function generatedDocument(index: number) {
  const content: object[] = [];
  for (let block = 0; block < 12; block++) {
    content.push({ type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: sentence(4) }] });
    content.push({ type: 'paragraph', content: [{ type: 'text', text: sentence(40) }] });
  }
  if (index % 10 === 0) content.push({ type: 'paragraph', content: [{ type: 'text', text: `Give the port a position tolerance at LMC. ${sentence(10)}` }] });
  // Formulas are indexed by their LaTeX source; fixed text, so the seeded sentences stay as they were.
  if (index % 10 === 5) {
    content.push({
      type: 'paragraph',
      content: [{ type: 'text', text: 'The wall holds while' }, { type: 'inlineMath', attrs: { latex: 'p_{burst} = \\frac{2\\,t\\,S}{d}' } }, { type: 'text', text: 'stays above the proof pressure.' }],
    });
  }
  const hex = index.toString(16).padStart(12, '0');
  content.push({
    type: 'calculatorBlock',
    attrs: { blockId: `00000000-0000-4000-8000-${hex}`, method: 'wall-thickness', caption: `${sentence(6)} calculator ${index}` },
  });
  return { type: 'doc', content };
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}

async function main(): Promise<void> {
  const client = await PGlite.create(process.env.BENCH_DATA_DIR ? { dataDir: process.env.BENCH_DATA_DIR } : {});
  const handle = wrapPglite(client);
  await handle.migrate(resolve(here, '../../../drizzle'));
  const pages = new PagesRepository(handle.db);
  const search = new SearchService(new SearchRepository(handle.db));
  const [collection] = await handle.db.insert(collections).values({ key: 'bench', name: 'Bench' }).returning();

  const started = Date.now();
  for (let batch = 0; batch < pageCount; batch += 250) {
    await pages.transaction(async (tx) => {
      for (let index = batch; index < Math.min(pageCount, batch + 250); index++) {
        const prepared = preparePageContent(generatedDocument(index));
        if (!prepared.ok) throw new Error(JSON.stringify(prepared.fields));
        const documentNumber = `BN-STD-${String(index).padStart(5, '0')}`;
        const page = await pages.insertPage({ documentNumber, collectionId: collection!.id, tags: [pick(trade), pick(trade)] }, tx);
        const revision = await pages.insertRevision({ pageId: page!.id, documentNumber, state: 'released', title: sentence(7), content: prepared.content, userId: null }, tx);
        await pages.updatePage(page!.id, { currentPublishedRevisionId: revision!.id }, tx);
      }
    });
  }
  await client.exec('analyze');
  console.log(`Loaded ${pageCount} published pages (about 520 words each) in ${((Date.now() - started) / 1000).toFixed(1)} s`);

  const queries: [string, Record<string, string>][] = [
    ['one common word', { q: 'wall' }],
    ['three words', { q: 'minimum wall bore' }],
    ['a phrase', { q: '"position tolerance"' }],
    ['a rare word', { q: filler[1234]! }],
    ['a document number prefix', { q: 'BN-STD-001' }],
    ['a word with a tag filter', { q: 'flange', tag: 'bolt' }],
    ['a symbol inside a formula', { q: 'burst' }],
  ];
  console.log(`\nGET /api/search service time, ${runs} runs each after one warm-up (ms)`);
  console.log('query                         matches    p50    p95    max');
  for (const [label, query] of queries) {
    const parsed = { q: query.q!, tag: query.tag, collection: undefined, limit: 20, offset: 0 };
    const first = await search.search(parsed);
    const times: number[] = [];
    for (let run = 0; run < runs; run++) {
      const start = performance.now();
      await search.search(parsed);
      times.push(performance.now() - start);
    }
    times.sort((a, b) => a - b);
    console.log(
      `${label.padEnd(30)}${String(first.total).padStart(7)}${percentile(times, 50).toFixed(1).padStart(7)}${percentile(times, 95).toFixed(1).padStart(7)}${times[times.length - 1]!.toFixed(1).padStart(7)}`,
    );
  }
  await handle.close();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
