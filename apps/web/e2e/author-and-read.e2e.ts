import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { useAppUnderTest } from './support/app-under-test';
import { openPage } from './support/browser';
import { demo, signIn, signOut } from './support/flows';

const documentNumber = 'BW-STD-900';
const textPayload = '<img src=x onerror=window.__xss=1>';
const scriptPayload = '<script>window.__xss=2</script>';
const captionPayload = 'Port P1 wall <img src=x onerror=window.__xss=3>';

// Screenshots for review only when asked for: LIMITBOOK_SHOTS_DIR=/tmp/shots-editor.
const shotsDir = process.env.LIMITBOOK_SHOTS_DIR;
async function shot(page: Page, name: string) {
  if (!shotsDir) return;
  mkdirSync(shotsDir, { recursive: true });
  await page.screenshot({ path: join(shotsDir, `${name}.png`) });
}

async function noXss(page: Page) {
  expect(await page.evaluate(() => (window as unknown as { __xss?: unknown }).__xss)).toBeUndefined();
}

async function pickRadio(scope: Locator, path: string, label: RegExp) {
  await scope.locator(`[data-path="${path}"]`).getByText(label).click();
}

async function fillNumber(scope: Locator, path: string, value: string) {
  const input = scope.locator(`input[data-path="${path}"]`);
  await input.fill(value);
}

describe('authoring a standard and reading it', () => {
  const app = useAppUnderTest();

  it('an author writes a page with a wall calculator and submits it for review; a reviewer approves it as revision A; a reader runs it; no typed payload ever executes', async () => {
    const author = await openPage(app.browser, app.server.baseUrl);
    const dialogs: string[] = [];
    const page = author.page;
    page.on('response', (response) => {
      if (response.status() === 404) author.problems.push(`404 ${response.url()}`);
    });
    page.on('dialog', (dialog) => {
      dialogs.push(dialog.message());
      void dialog.dismiss();
    });
    try {
      await signIn(page, demo.author.email, demo.author.password);

      // Create the page.
      await page.goto('/standards/new');
      await page.getByRole('heading', { name: 'New standard' }).waitFor();
      await page.getByRole('textbox', { name: 'Document number' }).fill(documentNumber);
      await page.getByRole('combobox', { name: 'Collection' }).click();
      await page.getByRole('option').first().click();
      await page.getByRole('textbox', { name: 'Title' }).fill('Minimum wall around a bore in a boss');
      await page.getByRole('button', { name: 'Create and start writing' }).click();
      await page.waitForURL(`**/standards/${documentNumber}/edit`);
      const body = page.getByRole('textbox', { name: 'Page body' });
      await body.waitFor();
      await shot(page, '1-empty-editor');

      // Text, with payloads typed as text.
      await body.click();
      await page.keyboard.type(`Purpose: keep the wall between the bore and the boss. ${textPayload} and ${scriptPayload} are text here.`);
      await page.keyboard.press('Enter');

      // A wall calculator with defaults, a lock, a rule and a caption.
      await page.getByRole('button', { name: 'Insert calculator' }).click();
      const block = page.getByRole('group', { name: /^Calculator/ });
      await block.getByRole('combobox', { name: 'Method' }).click();
      await page.getByRole('option', { name: 'Wall between two features of size located by position' }).click();
      await block.locator('input[data-path="positionTolerance"]').waitFor();
      await pickRadio(block, 'arrangement', /^coaxial$/i);
      await pickRadio(block, 'feature.featureType', /^internal$/i);
      await fillNumber(block, 'feature.lowerLimit', '19.9');
      await fillNumber(block, 'feature.upperLimit', '20.1');
      await pickRadio(block, 'datum.featureType', /^external$/i);
      await fillNumber(block, 'datum.lowerLimit', '29.9');
      await fillNumber(block, 'datum.upperLimit', '30.1');
      await fillNumber(block, 'positionTolerance', '0.2');
      await pickRadio(block, 'toleranceModifier', /^LMC$/);
      await pickRadio(block, 'datumModifier', /^LMB$/);
      await block.getByRole('button', { name: 'Lock Position tolerance for readers' }).click();
      await block.getByRole('button', { name: 'Unlock Position tolerance for readers' }).waitFor();
      const rule = block.getByRole('combobox', { name: /Acceptance rule/ });
      await rule.fill('minWall >= 1.5 mm');
      await rule.press('Escape');
      await block.getByRole('textbox', { name: /Caption/ }).fill(captionPayload);
      // The server's preview of the defaults: Ø30 − Ø20 at LMC/LMB, 0.2 position.
      await block.getByTestId('headline-value').waitFor();
      await block.locator('[data-verdict="pass"]').waitFor();
      await block.evaluate((element) => {
        element.scrollIntoView({ block: 'start' });
        window.scrollBy(0, -175);
      });
      await shot(page, '2-calculator-edit-mode');
      await noXss(page);

      // A block without a method is refused by the server, with the reason listed.
      await page.getByRole('button', { name: 'Insert calculator' }).click();
      await page.keyboard.press('Control+s');
      const refused = page.getByRole('alert').filter({ hasText: 'The draft was not saved' });
      await refused.waitFor();
      expect(await refused.textContent()).toMatch(/calculator.*method/i);
      await shot(page, '3-server-validation-error');
      await page.getByRole('group', { name: 'Calculator: New calculator' }).getByRole('button', { name: 'Remove calculator' }).click();

      await page.keyboard.press('Control+s');
      await page.getByRole('status').filter({ hasText: /^Saved/ }).waitFor();

      // Someone else saves the draft meanwhile: the next save is refused, and nothing is lost.
      const other = await openPage(app.browser, app.server.baseUrl);
      try {
        await signIn(other.page, demo.author.email, demo.author.password);
        await other.page.goto(`/standards/${documentNumber}/edit`);
        // Click into text, not onto the calculator: typing over a selected block replaces it, as in any editor.
        await other.page.getByRole('textbox', { name: 'Page body' }).getByText(/^Purpose:/).click();
        await other.page.keyboard.press('Control+End');
        await other.page.keyboard.type('A note from a second window.');
        await other.page.getByRole('button', { name: /Save draft/ }).click();
        await other.page.getByRole('status').filter({ hasText: /^Saved/ }).waitFor();
      } finally {
        await other.context.close();
      }
      await body.getByText(/^Purpose:/).click();
      await page.keyboard.press('Control+End');
      await page.keyboard.type('Scope: every bore located to its boss.');
      await page.keyboard.press('Control+s');
      const conflict = page.getByRole('dialog', { name: 'Someone else saved this draft' });
      await conflict.waitFor();
      await conflict.getByText(/version 3/).first().waitFor();
      await shot(page, '4-conflict-dialog');
      await conflict.getByRole('button', { name: 'Keep my copy' }).click();
      await page.getByText('You are keeping your copy').waitFor();
      await page.keyboard.press('Control+s');
      await page.getByRole('status').filter({ hasText: /^Saved/ }).waitFor();
      await expect.poll(() => body.textContent()).toContain('Scope: every bore located to its boss.');
      expect(await page.getByRole('group', { name: /^Calculator: Wall between/ }).count()).toBe(1);

      // Publishing now goes through review: ask the demo reviewer.
      await page.getByRole('button', { name: 'Submit for review' }).click();
      const submitDialog = page.getByRole('dialog', { name: `Submit ${documentNumber} for review` });
      await submitDialog.getByLabel(/^Reviewers/).click();
      await page.getByRole('option', { name: new RegExp(demo.reviewer.name) }).click();
      await submitDialog.getByLabel(/Note for the reviewers/).fill('First issue: please check the wall rule.');
      await submitDialog.getByRole('button', { name: 'Submit for review' }).click();
      await page.getByText('In review: read-only').waitFor();
      await page.getByRole('button', { name: 'Withdraw' }).waitFor();
      expect(await body.getAttribute('contenteditable')).toBe('false');
      await shot(page, '5-in-review');
      await noXss(page);
      await signOut(page, demo.author.name);
    } finally {
      await author.context.close();
    }
    expect(dialogs).toEqual([]);
    // The session restore before sign-in (401), the refused save (400) and the stale save (409) are expected.
    expect(author.problems.filter((problem) => !/status of (401|400|409)/.test(problem))).toEqual([]);

    // The reviewer opens the revision in review and approves it: it is released as revision A.
    const reviewer = await openPage(app.browser, app.server.baseUrl);
    try {
      const reviewerPage = reviewer.page;
      await signIn(reviewerPage, demo.reviewer.email, demo.reviewer.password);
      await reviewerPage.goto(`/standards/${documentNumber}?view=draft`);
      const review = reviewerPage.getByRole('alert', { name: 'Revision in review' });
      await review.getByText('First issue: please check the wall rule.').waitFor();
      await review.getByRole('button', { name: 'Approve' }).click();
      const approveDialog = reviewerPage.getByRole('dialog', { name: `Approve ${documentNumber}?` });
      await approveDialog.getByLabel(/Comment/).fill('Checked against the drawing rules.');
      await approveDialog.getByRole('button', { name: 'Approve and release' }).click();
      await reviewerPage.waitForURL((url) => url.pathname === `/standards/${documentNumber}` && url.search === '');
      await reviewerPage.getByText('Rev. A').waitFor();
      await noXss(reviewerPage);
    } finally {
      await reviewer.context.close();
    }
    expect(reviewer.problems.filter((problem) => !/status of 401/.test(problem))).toEqual([]);

    // The reader runs the released calculator.
    const reader = await openPage(app.browser, app.server.baseUrl);
    const readerPage = reader.page;
    readerPage.on('dialog', (dialog) => {
      dialogs.push(dialog.message());
      void dialog.dismiss();
    });
    try {
      await signIn(readerPage, demo.reader.email, demo.reader.password);
      await readerPage.goto(`/standards/${documentNumber}`);
      await readerPage.getByText('Rev. A').waitFor();
      await readerPage.getByText(textPayload, { exact: false }).first().waitFor();
      const card = readerPage.locator('section[data-calculator-block]');
      await shot(readerPage, '5-reader-page');
      await card.getByText(captionPayload).first().waitFor();
      const locked = card.locator('input[data-path="positionTolerance"]');
      await expect.poll(() => locked.getAttribute('readonly')).not.toBeNull();
      expect(await locked.inputValue()).toBe('0.2');

      const headline = card.getByTestId('headline-value');
      await headline.waitFor();
      const before = (await headline.textContent()) ?? '';
      // LMC with the datum at LMB: (29.9 − 20.1) / 2 − 0.2 / 2 = 4.8, the same at every produced size.
      expect(before).toMatch(/^4\.8\s*mm$/);
      await card.locator('[data-verdict="pass"]').waitFor();

      // A bigger bore leaves less wall: (29.9 − 24) / 2 − 0.1 = 2.85, still within the rule…
      await card.locator('input[data-path="feature.upperLimit"]').fill('24');
      await expect.poll(() => headline.textContent(), { timeout: 15_000 }).toMatch(/^2\.85\s*mm$/);
      await card.locator('[data-verdict="pass"]').waitFor();
      // …and (29.9 − 26.8) / 2 − 0.1 = 1.45 is below 1.5 mm.
      await card.locator('input[data-path="feature.upperLimit"]').fill('26.8');
      await expect.poll(() => headline.textContent(), { timeout: 15_000 }).toMatch(/^1\.45\s*mm$/);
      await card.locator('[data-verdict="fail"]').waitFor();

      await card.getByRole('button', { name: /Show derivation/ }).click();
      await expect.poll(() => card.locator('.katex').count()).toBeGreaterThan(0);
      await noXss(readerPage);
    } finally {
      await reader.context.close();
    }
    expect(dialogs).toEqual([]);
    expect(reader.problems.filter((problem) => !/status of 401/.test(problem))).toEqual([]);
  });
});
