import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, openPage } from './support/browser';
import { demo, signIn } from './support/flows';
import { startServer, type RunningServer } from './support/server';

const shots = process.env.LIMITBOOK_SHOTS_DIR ?? '/tmp/shots-csv-import';
const demoCsv = join(import.meta.dirname, '../../../content/demo/inspection-data/bw-ins-202-bv40-end-cover-sn0419.csv');

describe('CSV import into a calculator table in the built app', () => {
  let server: RunningServer;
  let browser: Browser;

  beforeAll(async () => {
    server = await startServer({ timeoutMs: 115_000 });
    browser = await launchBrowser();
    mkdirSync(shots, { recursive: true });
  });

  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('a reader imports the CMM report on BW-INS-202: rows replaced, then a file with a bad line appended', async () => {
    const { context, page, problems } = await openPage(browser, server.baseUrl);
    try {
      await signIn(page, demo.reader.email, demo.reader.password);
      await page.goto('/standards/BW-INS-202');
      const block = page.locator('[data-calculator-block]').first();
      await block.waitFor();
      await page.waitForFunction(() => document.querySelector<HTMLElement>('[data-calculator-block]')?.dataset.state === 'current', null, { timeout: 30_000 });
      // The defaults (serial number 0388) conform only with the datum feature shift.
      await block.getByText(/Pattern conforms with datum feature shift/).waitFor();

      const [chooser] = await Promise.all([page.waitForEvent('filechooser'), block.getByRole('button', { name: 'Import CSV into Measured features' }).click()]);
      await chooser.setFiles(demoCsv);
      await block.getByText('8 rows imported from bw-ins-202-bv40-end-cover-sn0419.csv (table replaced).').waitFor();
      expect(await block.getByRole('textbox', { name: 'Measured X, H3' }).inputValue()).toBe('60.071');
      await block.getByText('Pattern conforms as measured: all 8 features within size and position.').waitFor({ timeout: 20_000 });

      await block.getByText('Append rows').click();
      const [again] = await Promise.all([page.waitForEvent('filechooser'), block.getByRole('button', { name: 'Import CSV into Measured features' }).click()]);
      await again.setFiles({
        name: 'extra.csv',
        mimeType: 'text/csv',
        buffer: Buffer.from('label,basicX,basicY,x,y,size\nH9,30,45,30.02,45.01,10.55\nH10,-30,45,oops,45.0,10.55\n'),
      });
      await block.getByText('1 row imported from extra.csv (appended); 1 left out:').waitFor();
      expect(await block.getByLabel('Rows left out of the import').textContent()).toContain('Line 3');
      expect(await block.getByRole('textbox', { name: 'Label, H9' }).inputValue()).toBe('H9');
      await block.getByLabel('Rows left out of the import').scrollIntoViewIfNeeded();
      await page.screenshot({ path: `${shots}/bw-ins-202-import.png` });
      expect(problems.filter((problem) => !/401/.test(problem))).toEqual([]);
    } finally {
      await context.close();
    }
  });
});
