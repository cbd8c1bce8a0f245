import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { useAppUnderTest } from './support/app-under-test';
import { openPage } from './support/browser';
import { demo, signIn, signOut } from './support/flows';

const slug = 'gland-squeeze-check';
const methodId = `house:${slug}`;
const methodName = 'Gland squeeze check';
const documentNumber = 'BW-STD-950';

// Screenshots for review only when asked for: LIMITBOOK_SHOTS_DIR=/tmp/shots-methods.
const shotsDir = process.env.LIMITBOOK_SHOTS_DIR;
async function shot(page: Page, name: string, fullPage = false) {
  if (!shotsDir) return;
  mkdirSync(shotsDir, { recursive: true });
  await page.screenshot({ path: join(shotsDir, `${name}.png`), fullPage });
}

/** Records the address of every 404 beside the console's bare "Failed to load resource". */
function open404s(opened: Awaited<ReturnType<typeof openPage>>) {
  opened.page.on('response', (response) => {
    if (response.status() === 404) opened.problems.push(`404 ${response.url()}`);
  });
  return opened;
}

async function fill(scope: Page | Locator, path: string, value: string) {
  await scope.locator(`input[data-path="${path}"]`).fill(value);
}

describe('designing an in-house method and using it on a page', () => {
  const app = useAppUnderTest();

  // A whole author → reviewer → author → reviewer → reader round, on a shared 2-core machine.
  it('an author designs, tests and submits a method; a reviewer releases it; the author embeds it in a page that is approved; a reader runs it with their own numbers', async () => {
    // The author designs the method.
    const author = open404s(await openPage(app.browser, app.server.baseUrl));
    const page = author.page;
    try {
      await signIn(page, demo.author.email, demo.author.password);
      await page.getByRole('link', { name: 'Methods' }).click();
      await page.getByRole('heading', { name: 'Method catalog' }).waitFor();
      await page.locator('tr[data-method="wall-thickness"]').waitFor();
      await shot(page, '1-catalog');

      await page.getByRole('link', { name: 'New method' }).click();
      await page.getByRole('textbox', { name: 'Name' }).fill(methodName);
      expect(await page.getByRole('textbox', { name: 'Id' }).inputValue()).toBe(slug);
      await page.getByRole('textbox', { name: 'Description' }).fill('Squeeze of an O-ring cord in a static gland, in percent of the cord cross-section.');
      await page.getByRole('button', { name: 'Create and open the designer' }).click();
      await page.waitForURL(`**/methods/${methodId}/design`, { timeout: 30_000 });
      await page.getByRole('heading', { name: methodName }).waitFor();

      await page.getByRole('button', { name: 'Add input' }).click();
      await fill(page, 'inputs.0.name', 'cord');
      await fill(page, 'inputs.0.label', 'Cord cross-section');
      await fill(page, 'inputs.0.default', '3.53');
      await page.getByRole('button', { name: 'Add input' }).click();
      await fill(page, 'inputs.1.name', 'depth');
      await fill(page, 'inputs.1.label', 'Gland depth');
      await fill(page, 'inputs.1.default', '2.8');

      await page.getByRole('button', { name: 'Add output' }).click();
      await fill(page, 'outputs.0.name', 'squeeze');
      await fill(page, 'outputs.0.label', 'Squeeze');
      await fill(page, 'outputs.0.decimals', '2');
      // A misspelt name is reported at the expression that holds it.
      await fill(page, 'outputs.0.expression', '100 * (cord - dept) / cord');
      const expressionField = page.locator('[data-formula-row="outputs.0"]');
      await expect.poll(() => expressionField.textContent(), { timeout: 15_000 }).toMatch(/dept/);
      await expressionField.locator('.mantine-InputWrapper-error, [class*="error"]').first().waitFor();
      await shot(page, '2-designer-field-error');
      await fill(page, 'outputs.0.expression', '100 * (cord - depth) / cord');

      await page.getByRole('button', { name: 'Add check' }).click();
      await fill(page, 'checks.0.expression', 'squeeze >= 15');
      await fill(page, 'checks.0.message', 'At least 15 % squeeze');

      // The live preview: (3.53 − 2.80) / 3.53 = 20.68 % (Parker O-Ring Handbook ORD 5700, gland design; from memory).
      const preview = page.locator('section[data-preview-state="ok"]');
      await preview.waitFor({ timeout: 20_000 });
      await expect.poll(() => preview.locator('[data-output="squeeze"]').textContent(), { timeout: 15_000 }).toMatch(/20\.68/);
      await preview.locator('[data-verdict="pass"]').waitFor();
      await page.locator('[data-tex-for="outputs.0.expression"] .katex').waitFor();

      await page.getByRole('button', { name: 'Add test row' }).click();
      await page.getByRole('textbox', { name: 'Case 1' }).fill('Nominal gland');
      await page.getByRole('textbox', { name: 'cord, row 1' }).fill('3.53');
      await page.getByRole('textbox', { name: 'depth, row 1' }).fill('2.8');
      await page.getByRole('textbox', { name: 'Expected squeeze, row 1' }).fill('20.68');
      await page.getByRole('combobox', { name: 'Expected verdict, row 1' }).click();
      await page.getByRole('option', { name: 'Pass' }).click();
      // Submitting waits for a passing run of the table as it stands.
      expect(await page.getByRole('button', { name: 'Submit for review' }).isDisabled()).toBe(true);
      await page.getByRole('button', { name: 'Run tests' }).click();
      await page.getByTestId('test-summary').filter({ hasText: 'All 1 row passes.' }).waitFor({ timeout: 20_000 });
      await page.locator('[data-row-result="pass"]').waitFor();
      await shot(page, '3-designer-tests-pass', true);

      await page.getByRole('button', { name: 'Submit for review' }).click();
      const submitDialog = page.getByRole('dialog', { name: `Submit “${methodName}” for review` });
      await submitDialog.getByLabel(/^Reviewers/).click();
      await page.getByRole('option', { name: new RegExp(demo.reviewer.name) }).click();
      await submitDialog.getByLabel(/Note for the reviewers/).fill('Squeeze rule for static glands.');
      await submitDialog.getByRole('button', { name: 'Submit for review' }).click();
      await page.getByText('In review: read-only').waitFor();
      await signOut(page, demo.author.name);
    } finally {
      await author.context.close();
    }
    expect(author.problems.filter((problem) => !/status of (400|401)/.test(problem))).toEqual([]);

    // The reviewer reads the revision and its server test run, and releases it as v1.
    const reviewer = open404s(await openPage(app.browser, app.server.baseUrl));
    try {
      const reviewerPage = reviewer.page;
      await signIn(reviewerPage, demo.reviewer.email, demo.reviewer.password);
      await reviewerPage.goto(`/methods/${methodId}/review`);
      await reviewerPage.getByText('Note: Squeeze rule for static glands.').waitFor();
      await reviewerPage.getByText('The row passes on the server now.').waitFor({ timeout: 20_000 });
      await shot(reviewerPage, '4-method-review', true);
      await reviewerPage.getByRole('button', { name: 'Approve' }).click();
      const approve = reviewerPage.getByRole('dialog', { name: `Approve “${methodName}”?` });
      await approve.getByLabel(/Comment/).fill('Matches the gland tables.');
      await approve.getByRole('button', { name: 'Approve and release' }).click();
      await reviewerPage.waitForURL(`**/methods/${methodId}`);
      await reviewerPage.getByRole('heading', { name: methodName, level: 1 }).waitFor();
      await reviewerPage.locator('[data-formula="squeeze"] .katex').waitFor();
      await shot(reviewerPage, '5-method-page', true);
    } finally {
      await reviewer.context.close();
    }
    expect(reviewer.problems.filter((problem) => !/status of 401/.test(problem))).toEqual([]);

    // The author embeds the released method in a new page and submits the page.
    const again = open404s(await openPage(app.browser, app.server.baseUrl));
    try {
      const authorPage = again.page;
      await signIn(authorPage, demo.author.email, demo.author.password);
      await authorPage.goto('/standards/new');
      await authorPage.getByRole('textbox', { name: 'Document number' }).fill(documentNumber);
      await authorPage.getByRole('combobox', { name: 'Collection' }).click();
      await authorPage.getByRole('option').first().click();
      await authorPage.getByRole('textbox', { name: 'Title' }).fill('Static gland squeeze');
      await authorPage.getByRole('button', { name: 'Create and start writing' }).click();
      await authorPage.waitForURL(`**/standards/${documentNumber}/edit`);
      const body = authorPage.getByRole('textbox', { name: 'Page body' });
      await body.click();
      await authorPage.keyboard.type('Every static gland keeps at least 15 % squeeze.');
      await authorPage.keyboard.press('Enter');
      await authorPage.getByRole('button', { name: 'Insert calculator' }).click();
      const block = authorPage.getByRole('group', { name: /^Calculator/ });
      await block.getByRole('combobox', { name: 'Method' }).click();
      await authorPage.getByRole('option', { name: `${methodName} (v1)` }).click();
      await block.locator('[data-verdict="pass"]').waitFor({ timeout: 20_000 });
      await authorPage.keyboard.press('Control+s');
      await authorPage.getByRole('status').filter({ hasText: /^Saved/ }).waitFor();
      await authorPage.getByRole('button', { name: 'Submit for review' }).click();
      const submitDialog = authorPage.getByRole('dialog', { name: `Submit ${documentNumber} for review` });
      await submitDialog.getByLabel(/^Reviewers/).click();
      await authorPage.getByRole('option', { name: new RegExp(demo.reviewer.name) }).click();
      await submitDialog.getByRole('button', { name: 'Submit for review' }).click();
      await authorPage.getByText('In review: read-only').waitFor();
    } finally {
      await again.context.close();
    }

    const pageReviewer = open404s(await openPage(app.browser, app.server.baseUrl));
    try {
      const reviewerPage = pageReviewer.page;
      await signIn(reviewerPage, demo.reviewer.email, demo.reviewer.password);
      await reviewerPage.goto(`/standards/${documentNumber}?view=draft`);
      const review = reviewerPage.getByRole('alert', { name: 'Revision in review' });
      await review.getByRole('button', { name: 'Approve' }).click();
      await reviewerPage.getByRole('dialog', { name: `Approve ${documentNumber}?` }).getByRole('button', { name: 'Approve and release' }).click();
      await reviewerPage.waitForURL((url) => url.pathname === `/standards/${documentNumber}` && url.search === '');
      await reviewerPage.getByText('Rev. A').waitFor();
    } finally {
      await pageReviewer.context.close();
    }

    // A reader runs the block with a deeper gland: (3.53 − 3.10) / 3.53 = 12.18 %, below 15 %.
    const reader = open404s(await openPage(app.browser, app.server.baseUrl));
    try {
      const readerPage = reader.page;
      await signIn(readerPage, demo.reader.email, demo.reader.password);
      await readerPage.goto(`/standards/${documentNumber}`);
      const card = readerPage.locator(`section[data-method="${methodId}"]`);
      await card.locator('[data-verdict="pass"]').waitFor({ timeout: 20_000 });
      await card.locator('input[data-path="depth"]').fill('3.1');
      await expect.poll(() => card.locator('[data-output="squeeze"]').textContent(), { timeout: 15_000 }).toMatch(/12\.18/);
      await card.locator('[data-verdict="fail"]').waitFor();
      await shot(readerPage, '6-reader-runs-block', true);
    } finally {
      await reader.context.close();
    }
    expect(reader.problems.filter((problem) => !/status of 401/.test(problem))).toEqual([]);
  }, 420_000);
});
