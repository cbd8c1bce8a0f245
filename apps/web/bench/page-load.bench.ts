// Page load of the built app in headless chromium: time from navigation until every calculator block
// on the demo page with the most blocks shows a settled server result, cold (fresh browser context,
// empty cache) and warm (reload), and the JavaScript each route loads (gzip). Figures, not a test.
// Needs the built api and web app (npm run bench builds both first). Run: npx tsx apps/web/bench/page-load.bench.ts
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import type { Page as ApiPage, PageList } from '@limitbook/contracts';
import { listCalculatorBlocks } from '@limitbook/editor-schema';
import type { Browser, BrowserContext, Page, Response } from 'playwright-core';
import { launchBrowser, viewports } from '../e2e/support/browser';
import { demo } from '../e2e/support/flows';
import { repoRoot, startServer, type RunningServer } from '../e2e/support/server';

const runs = Math.max(5, Number(process.env.BENCH_RUNS ?? 7));
const settleTimeoutMs = 60_000;

type Person = { email: string; password: string };

interface Session {
  accessToken: string;
  /** The refresh cookie, which the web app trades for an access token when it starts. */
  cookie: { name: string; value: string };
}

function buildIfMissing(): void {
  const builds = [
    [join(repoRoot, 'apps/api/dist/main.js'), '@limitbook/api'],
    [join(repoRoot, 'apps/web/dist/index.html'), '@limitbook/web'],
  ] as const;
  for (const [file, project] of builds) {
    if (!existsSync(file) && !process.env.LIMITBOOK_E2E_SERVER) {
      console.log(`${file} is missing: building ${project}`);
      execFileSync('npx', ['nx', 'run', `${project}:build`, '--outputStyle=static'], { cwd: repoRoot, stdio: 'inherit' });
    }
  }
}

async function signInThroughApi(baseUrl: string, person: Person): Promise<Session> {
  const response = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: person.email, password: person.password }),
  });
  if (!response.ok) throw new Error(`Sign-in of ${person.email} answered ${response.status}: ${await response.text()}`);
  const { accessToken } = (await response.json()) as { accessToken: string };
  const [pair] = (response.headers.getSetCookie()[0] ?? '').split(';');
  const separator = pair?.indexOf('=') ?? -1;
  if (!pair || separator < 1) throw new Error('Sign-in set no refresh cookie');
  return { accessToken, cookie: { name: pair.slice(0, separator), value: pair.slice(separator + 1) } };
}

async function apiGet<T>(baseUrl: string, path: string, token: string): Promise<T> {
  const response = await fetch(`${baseUrl}${path}`, { headers: { authorization: `Bearer ${token}` } });
  if (!response.ok) throw new Error(`GET ${path} answered ${response.status}: ${await response.text()}`);
  return (await response.json()) as T;
}

interface DemoPage {
  documentNumber: string;
  title: string;
  blocks: number;
  formulas: number;
}

function countFormulas(node: { type?: string; content?: unknown[] }): number {
  const own = node.type === 'inlineMath' || node.type === 'blockMath' ? 1 : 0;
  return own + (node.content ?? []).reduce<number>((sum, child) => sum + countFormulas(child as { type?: string; content?: unknown[] }), 0);
}

/** Every released demo page a reader sees, the one with the most calculator blocks first. */
async function demoPagesByBlocks(baseUrl: string, token: string): Promise<DemoPage[]> {
  const summaries: PageList['items'] = [];
  for (let offset = 0; ; offset += 100) {
    const list = await apiGet<PageList>(baseUrl, `/api/pages?limit=100&offset=${offset}`, token);
    summaries.push(...list.items);
    if (list.items.length === 0 || summaries.length >= list.total) break;
  }
  const pages: DemoPage[] = [];
  for (const summary of summaries) {
    const page = await apiGet<ApiPage>(baseUrl, `/api/pages/${encodeURIComponent(summary.documentNumber)}`, token);
    const document = page.revision.document as Parameters<typeof listCalculatorBlocks>[0];
    pages.push({ documentNumber: page.documentNumber, title: page.revision.title, blocks: listCalculatorBlocks(document).length, formulas: countFormulas(document) });
  }
  // Stable: among pages with as many blocks, the first by document number.
  pages.sort((a, b) => b.blocks - a.blocks || a.documentNumber.localeCompare(b.documentNumber));
  if (!pages[0] || pages[0].blocks === 0) throw new Error('No demo page with calculator blocks found');
  return pages;
}

async function signedInContext(browser: Browser, server: RunningServer, person: Person): Promise<BrowserContext> {
  const session = await signInThroughApi(server.baseUrl, person);
  const context = await browser.newContext({ baseURL: server.baseUrl, viewport: viewports.desktop, locale: 'en-GB', timezoneId: 'Europe/London' });
  context.setDefaultTimeout(settleTimeoutMs);
  const { hostname } = new URL(server.baseUrl);
  await context.addCookies([{ ...session.cookie, domain: hostname, path: '/api/auth', httpOnly: true, sameSite: 'Strict' }]);
  return context;
}

interface Settled {
  /** ms since the navigation started, from the page's own clock. */
  ms: number;
  current: number;
  failed: number;
}

/** Waits until the page shows `expected` calculator blocks and none of them is still evaluating. */
async function waitForBlocks(page: Page, expected: number): Promise<Settled> {
  const handle = await page.waitForFunction(
    (count) => {
      const blocks = [...document.querySelectorAll<HTMLElement>('[data-calculator-block]')];
      if (blocks.length !== count) return false;
      const states = blocks.map((block) => block.dataset.state);
      if (states.some((state) => state !== 'current' && state !== 'error')) return false;
      return { ms: performance.now(), current: states.filter((state) => state === 'current').length, failed: states.filter((state) => state === 'error').length };
    },
    expected,
    { polling: 'raf', timeout: settleTimeoutMs },
  );
  return (await handle.jsonValue()) as Settled;
}

function percentile(values: number[], fraction: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  // Nearest rank: the smallest value with at least `fraction` of the runs at or below it.
  return sorted[Math.max(0, Math.ceil(fraction * sorted.length) - 1)]!;
}

interface LoadedScript {
  path: string;
  bytes: number;
  gzipBytes: number;
  /** True when the server compressed it; otherwise `gzipBytes` is what gzip would make of it. */
  servedCompressed: boolean;
}

/** Records every JavaScript file the page loads from our origin, with its size gzip-compressed. */
function recordScripts(page: Page, origin: string): { scripts: () => Promise<LoadedScript[]> } {
  const pending: Promise<LoadedScript | null>[] = [];
  page.on('response', (response: Response) => {
    const url = new URL(response.url());
    if (url.origin !== origin || !url.pathname.endsWith('.js')) return;
    pending.push(
      (async () => {
        const body = await response.body().catch(() => null);
        if (!body) return null;
        const encoding = (await response.allHeaders())['content-encoding'];
        const servedCompressed = encoding === 'gzip';
        const gzipBytes = servedCompressed ? (await response.request().sizes()).responseBodySize : gzipSync(body).length;
        return { path: url.pathname, bytes: body.length, gzipBytes, servedCompressed };
      })(),
    );
  });
  return {
    scripts: async () => {
      const unique = new Map<string, LoadedScript>();
      for (const script of await Promise.all(pending)) if (script) unique.set(script.path, script);
      return [...unique.values()].sort((a, b) => b.gzipBytes - a.gzipBytes);
    },
  };
}

const kib = (bytes: number) => `${(bytes / 1024).toFixed(1)} kB`;
const fileName = (path: string) => path.split('/').pop() ?? path;
// Vite names a lazy chunk after its module: the editor route's chunk and KaTeX's.
const isEditorChunk = (path: string) => /^edit-[\w-]+\.js$/.test(fileName(path));
const isKatexChunk = (path: string) => /^katex-[\w-]+\.js$/.test(fileName(path));

async function measureLoads(browser: Browser, server: RunningServer, target: { documentNumber: string; blocks: number }) {
  const cold: Settled[] = [];
  const warm: Settled[] = [];
  const route = `/standards/${encodeURIComponent(target.documentNumber)}`;
  for (let run = 0; run < runs; run += 1) {
    const context = await signedInContext(browser, server, demo.reader);
    try {
      const page = await context.newPage();
      await page.goto(route);
      cold.push(await waitForBlocks(page, target.blocks));
      if (run === 0 && process.env.BENCH_SCREENSHOT) await page.screenshot({ path: process.env.BENCH_SCREENSHOT, fullPage: true });
      await page.reload();
      warm.push(await waitForBlocks(page, target.blocks));
    } finally {
      await context.close();
    }
  }
  return { cold, warm };
}

async function scriptsOfRoute(browser: Browser, server: RunningServer, person: Person, route: string, ready: (page: Page) => Promise<void>) {
  const context = await signedInContext(browser, server, person);
  try {
    const page = await context.newPage();
    const recorder = recordScripts(page, new URL(server.baseUrl).origin);
    await page.goto(route);
    await ready(page);
    // Lazy chunks requested right after the first render (charts, formulas) come in too.
    await page.waitForLoadState('networkidle');
    const before = await recorder.scripts();
    return { page, context, recorder, before };
  } catch (error) {
    await context.close();
    throw error;
  }
}

async function main(): Promise<void> {
  buildIfMissing();
  const server = await startServer({ env: { LIMITBOOK_AUTH_RATE_LIMIT: '100000' }, timeoutMs: 180_000 });
  const browser = await launchBrowser();
  try {
    const reader = await signInThroughApi(server.baseUrl, demo.reader);
    const pages = await demoPagesByBlocks(server.baseUrl, reader.accessToken);
    const target = pages[0]!;
    console.log(`\nCalculator blocks per demo page: ${pages.map((page) => `${page.documentNumber} ${page.blocks}`).join(', ')}`);
    console.log(`Largest: ${target.documentNumber} "${target.title}", ${target.blocks} calculator blocks, ${target.formulas} formulas in its text; ${runs} runs, desktop viewport, loopback`);

    const { cold, warm } = await measureLoads(browser, server, target);
    const row = (label: string, samples: Settled[]) => ({
      load: label,
      'median ms': Math.round(percentile(samples.map((sample) => sample.ms), 0.5)),
      'p90 ms': Math.round(percentile(samples.map((sample) => sample.ms), 0.9)),
      'min ms': Math.round(Math.min(...samples.map((sample) => sample.ms))),
      'max ms': Math.round(Math.max(...samples.map((sample) => sample.ms))),
      'blocks current': samples.map((sample) => sample.current).join('/'),
      'blocks refused': Math.max(...samples.map((sample) => sample.failed)),
    });
    console.log('Navigation start → every calculator block settled (data-state current or error)');
    console.table([row('cold (new context, empty cache)', cold), row('warm (reload)', warm)]);

    const blocksSettled = (page: Page) => waitForBlocks(page, target.blocks).then(() => undefined);
    const reading = await scriptsOfRoute(browser, server, demo.reader, `/standards/${encodeURIComponent(target.documentNumber)}`, blocksSettled);
    let readingAfterDerivation: LoadedScript[];
    try {
      await reading.page.getByRole('button', { name: /^Show derivation/ }).first().click();
      await reading.page.locator('[data-latex-state="typeset"]').first().waitFor();
      await reading.page.waitForLoadState('networkidle');
      readingAfterDerivation = await reading.recorder.scripts();
    } finally {
      await reading.context.close();
    }
    const editing = await scriptsOfRoute(browser, server, demo.author, `/standards/${encodeURIComponent(target.documentNumber)}/edit`, async (page) => {
      await page.locator('.ProseMirror').first().waitFor();
      // The editor typesets the page's formulas as it shows them: wait for that, not for a quiet network alone.
      if (target.formulas > 0) await page.locator('.ProseMirror [data-latex-state="typeset"]').first().waitFor();
    });
    await editing.context.close();

    const total = (scripts: LoadedScript[]) => scripts.reduce((sum, script) => sum + script.gzipBytes, 0);
    const raw = (scripts: LoadedScript[]) => scripts.reduce((sum, script) => sum + script.bytes, 0);
    const compressedByServer = [...reading.before, ...editing.before].some((script) => script.servedCompressed);
    console.log(`JavaScript loaded per route (${compressedByServer ? 'as served, gzip' : 'the server does not compress: sizes are gzip of the served files, node:zlib level 6'})`);
    console.table(
      [
        { route: '/standards/:doc (reader, after the blocks settled)', scripts: reading.before },
        { route: '/standards/:doc after "Show derivation"', scripts: readingAfterDerivation },
        { route: '/standards/:doc/edit (author)', scripts: editing.before },
      ].map(({ route, scripts }) => ({
        route,
        files: scripts.length,
        raw: kib(raw(scripts)),
        gzip: kib(total(scripts)),
        'editor chunk': scripts.some((script) => isEditorChunk(script.path)) ? 'loaded' : 'no',
        KaTeX: scripts.some((script) => isKatexChunk(script.path)) ? 'loaded' : 'no',
      })),
    );
    console.log('Largest files on the reading route (gzip):', reading.before.slice(0, 6).map((script) => `${fileName(script.path)} ${kib(script.gzipBytes)}`).join(', '));
    console.log('Largest files on the editor route (gzip):', editing.before.slice(0, 6).map((script) => `${fileName(script.path)} ${kib(script.gzipBytes)}`).join(', '));

    const editorOnReading = reading.before.filter((script) => isEditorChunk(script.path));
    const katexOnReading = reading.before.filter((script) => isKatexChunk(script.path));
    const checks = [
      { check: 'editor chunk not loaded on the reading route', pass: editorOnReading.length === 0, detail: editorOnReading.map((script) => fileName(script.path)).join(', ') || 'none' },
      {
        check: 'KaTeX not loaded on the reading route before a derivation is opened',
        pass: katexOnReading.length === 0,
        detail:
          katexOnReading.length === 0
            ? 'none'
            : `${katexOnReading.map((script) => fileName(script.path)).join(', ')}${target.formulas > 0 ? `: the page text has ${target.formulas} formulas, and KaTeX loads with the first one shown` : ''}`,
      },
      { check: 'editor chunk loaded on the editor route', pass: editing.before.some((script) => isEditorChunk(script.path)), detail: editing.before.filter((script) => isEditorChunk(script.path)).map((script) => fileName(script.path)).join(', ') },
      { check: 'KaTeX loaded once a derivation is open', pass: readingAfterDerivation.some((script) => isKatexChunk(script.path)), detail: '' },
    ];
    console.table(checks.map(({ check, pass, detail }) => ({ check, result: pass ? 'yes' : 'NO', detail })));
  } finally {
    await browser.close();
    await server.stop();
  }
}

await main();
