import { existsSync, mkdirSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, openPage, viewports } from './support/browser';
import { demo, signIn } from './support/flows';
import { startServer, type RunningServer } from './support/server';

const shots = process.env.LIMITBOOK_SHOTS_DIR ?? '/tmp/shots-reader';

type DocNode = { type: string; content?: DocNode[] };
const countBlocks = (node: DocNode): number => (node.type === 'calculatorBlock' ? 1 : (node.content ?? []).reduce((sum, child) => sum + countBlocks(child), 0));

async function api<T>(server: RunningServer, path: string, token: string): Promise<T> {
  const response = await fetch(`${server.baseUrl}${path}`, { headers: { Authorization: `Bearer ${token}` } });
  if (!response.ok) throw new Error(`${path}: HTTP ${response.status}`);
  return (await response.json()) as T;
}

/** Waits until every calculator block has settled (current or error) and returns the ones in error. */
async function settledBlocks(page: Page, expected: number) {
  await page.waitForFunction(
    (count) => {
      const blocks = [...document.querySelectorAll<HTMLElement>('[data-calculator-block]')];
      return blocks.length === count && blocks.every((block) => block.dataset.state === 'current' || block.dataset.state === 'error');
    },
    expected,
    { timeout: 30_000 },
  );
  return page.$$eval('[data-calculator-block][data-state="error"]', (blocks) => blocks.map((block) => `${block.querySelector('h3')?.textContent}: ${block.querySelector('[role="alert"]')?.textContent ?? ''}`));
}

describe('the demo library in the built app', () => {
  let server: RunningServer;
  let browser: Browser;
  let token: string;

  beforeAll(async () => {
    // Loading the demo library into a fresh database is the slow part of start-up on a busy machine.
    server = await startServer({ timeoutMs: 115_000 });
    browser = await launchBrowser();
    const response = await fetch(`${server.baseUrl}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: demo.reader.email, password: demo.reader.password }),
    });
    token = ((await response.json()) as { accessToken: string }).accessToken;
    mkdirSync(shots, { recursive: true });
  });

  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('every demo page loads and every calculator block on it evaluates, in one request per page', async () => {
    const list = await api<{ items: { documentNumber: string; title: string }[] }>(server, '/api/pages?limit=200', token);
    expect(list.items.length).toBeGreaterThanOrEqual(8);
    const { context, page, problems } = await openPage(browser, server.baseUrl);
    const evaluations: string[] = [];
    page.on('request', (request) => {
      const path = new URL(request.url()).pathname;
      if (request.method() === 'POST' && (path === '/api/evaluate' || /^\/api\/methods\/[^/]+\/evaluate$/.test(path))) evaluations.push(path);
    });
    try {
      await signIn(page, demo.reader.email, demo.reader.password);
      let total = 0;
      for (const summary of list.items) {
        const detail = await api<{ revision: { title: string; document: DocNode } }>(server, `/api/pages/${summary.documentNumber}`, token);
        const blocks = countBlocks(detail.revision.document);
        total += blocks;
        evaluations.length = 0;
        await page.goto(`/standards/${summary.documentNumber}`);
        await page.getByRole('heading', { level: 1, name: detail.revision.title }).waitFor();
        const failed = await settledBlocks(page, blocks);
        expect(failed, `${summary.documentNumber} has blocks in error`).toEqual([]);
        // One batch on load, no block asking on its own.
        if (blocks > 0) expect(evaluations, summary.documentNumber).toEqual(['/api/evaluate']);
        expect(await page.locator('[data-calculator-block] [data-testid="stale-label"]').count()).toBe(0);
      }
      expect(total).toBeGreaterThanOrEqual(20);
      expect(problems.filter((problem) => !problem.includes('401'))).toEqual([]);
    } finally {
      await context.close();
    }
  });

  it('a reader changes an input on BW-STD-112 and sees the server’s new minimum wall, verdict and derivation', async () => {
    const { context, page, problems } = await openPage(browser, server.baseUrl);
    try {
      await signIn(page, demo.reader.email, demo.reader.password);
      await page.goto('/standards/BW-STD-112');
      await settledBlocks(page, 3);
      const block = page.locator('[data-calculator-block]').first();
      await expect(block.getByTestId('headline-value').textContent()).resolves.toMatch(/^4\.8\s*mm$/);
      await expect(block.getByRole('textbox', { name: /Tolerance modifier|Arrangement/ }).count()).resolves.toBe(0);

      // Ø0.2 → Ø7: w = (29.9 − 20.1 − 7) / 2 = 1.4 mm, below the 1.5 mm of Table 1.
      const tolerance = block.getByRole('textbox', { name: /^Position tolerance/ });
      const answered = page.waitForResponse((response) => response.url().endsWith('/api/methods/wall-thickness/evaluate') && response.request().method() === 'POST');
      await tolerance.fill('7');
      await expect(block.getAttribute('data-state')).resolves.toMatch(/updating|current/);
      expect((await answered).status()).toBe(200);
      await page.waitForFunction(() => document.querySelector('[data-calculator-block]')?.getAttribute('data-state') === 'current');
      await expect(block.getByTestId('headline-value').textContent()).resolves.toMatch(/^1\.4\s*mm$/);
      await expect(block.locator('[data-verdict]').getAttribute('data-verdict')).resolves.toBe('fail');
      await block.getByText('Fails the rule minWall ≥ 1.5 mm').waitFor();

      await block.getByRole('button', { name: /Show derivation/ }).click();
      await block.locator('.katex').first().waitFor();
      expect(await block.locator('.katex').count()).toBeGreaterThan(5);

      // Invalid input: the server's message lands at the field, the last result is kept but marked out of date.
      const lower = block.getByRole('group', { name: /Located feature/ }).getByRole('textbox', { name: /^Lower limit/ });
      await lower.fill('21');
      await page.waitForFunction(() => document.querySelector('[data-calculator-block]')?.getAttribute('data-state') === 'error');
      await expect(lower.getAttribute('aria-invalid')).resolves.toBe('true');
      await block.getByText('Lower limit must not exceed the upper limit').waitFor();
      await expect(block.getByTestId('stale-label').textContent()).resolves.toMatch(/Out of date/);

      // Back to the standard's values, then in inches: lengths are converted and the server answers in inches.
      await block.getByRole('button', { name: 'Reset to the standard’s values' }).click();
      await page.waitForFunction(() => document.querySelector('[data-calculator-block]')?.getAttribute('data-state') === 'current');
      await block.getByRole('radiogroup', { name: 'Unit of length' }).getByText('in', { exact: true }).click();
      await expect(block.getByRole('group', { name: /Located feature/ }).getByRole('textbox', { name: /^Lower limit/ }).inputValue()).resolves.toBe('0.783465');
      await page.waitForFunction(() => {
        const first = document.querySelector('[data-calculator-block]');
        return first?.getAttribute('data-state') === 'current' && /in$/.test(first.querySelector('[data-testid="headline-value"]')?.textContent ?? '');
      });
      await expect(block.getByTestId('headline-value').textContent()).resolves.toMatch(/^0\.18\d*\s*in$/);
      expect(problems.filter((problem) => !problem.includes('401') && !problem.includes('400'))).toEqual([]);
    } finally {
      await context.close();
    }
  });

  it('screens of the reader side at desktop and phone sizes', async () => {
    for (const [name, viewport] of Object.entries(viewports)) {
      const { context, page } = await openPage(browser, server.baseUrl, viewport);
      try {
        await signIn(page, demo.reader.email, demo.reader.password);
        const visit = async (path: string, file: string, ready: () => Promise<unknown>) => {
          await page.goto(path);
          await ready();
          await page.waitForTimeout(600);
          await page.screenshot({ path: `${shots}/${file}-${name}.png`, fullPage: true });
        };
        await visit('/library', 'library-home', () => page.getByRole('heading', { name: 'Collections' }).waitFor());
        await visit('/library/design-rules', 'collection', () => page.getByRole('link', { name: /Minimum wall between cross-drilled ports/ }).first().waitFor());
        await visit('/search?q=wall%20bore', 'search', () => page.getByRole('list', { name: 'Search results' }).waitFor());
        for (const number of ['BW-STD-112', 'BW-STD-140', 'BW-STD-130']) {
          await visit(`/standards/${number}`, number, async () => {
            await page.getByRole('heading', { level: 1 }).waitFor();
            const count = await page.locator('[data-calculator-block]').count();
            await settledBlocks(page, Math.max(count, 1));
            await page.locator('figure, .recharts-surface').first().waitFor({ state: 'attached', timeout: number === 'BW-STD-130' ? 1 : 15_000 }).catch(() => undefined);
          });
        }
      } finally {
        await context.close();
      }
    }
    for (const file of ['library-home', 'collection', 'search', 'BW-STD-112', 'BW-STD-140', 'BW-STD-130']) {
      for (const name of Object.keys(viewports)) expect(existsSync(`${shots}/${file}-${name}.png`), `${file}-${name}`).toBe(true);
    }
  });
});
