import { type BatchEvaluateResponse, maxBatchItems, type Page, type PageList } from '@limitbook/contracts';
import { type LimitbookDocument, listCalculatorBlocks } from '@limitbook/editor-schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { workspaceRoot } from '../../../config/workspace-paths.js';
import { SeedService } from '../../../seed/seed.service.js';
import { createTestApp, type TestApp } from '../../../testing/test-app.js';
import { listDemoStandardFiles } from './demo-content.js';

describe('the demo library on a fresh database', () => {
  let t: TestApp;
  let reader: string;
  let pages: Page[];

  beforeAll(async () => {
    t = await createTestApp();
    reader = await t.signIn('reader');
    const list = await t.http.get('/api/pages?limit=200').set('Authorization', `Bearer ${reader}`).expect(200);
    pages = [];
    for (const item of (list.body as PageList).items) {
      const page = await t.http.get(`/api/pages/${item.documentNumber}`).set('Authorization', `Bearer ${reader}`).expect(200);
      pages.push(page.body as Page);
    }
  });
  afterAll(async () => {
    await t?.close();
  });

  it('releases every standard in content/demo/standards as revision A approved by the demo reviewer, readable by a reader', async () => {
    const files = await listDemoStandardFiles(`${workspaceRoot()}/content`);
    expect(pages).toHaveLength(files.length);
    for (const page of pages) {
      expect(page.revision).toMatchObject({ state: 'released', revisionLetter: 'A', publishedBy: { email: t.demoPerson('reviewer').email } });
      expect(page.owner?.email).toMatch(/@brackwater\.example$/);
    }
    const collections = await t.http.get('/api/collections').set('Authorization', `Bearer ${reader}`).expect(200);
    expect((collections.body as { items: { pageCount: number }[] }).items.reduce((sum, item) => sum + item.pageCount, 0)).toBe(files.length);
  });

  it("evaluates every calculator block's defaults without an error", async () => {
    const blocks = pages.flatMap((page) => listCalculatorBlocks(page.revision.document as LimitbookDocument).map((block) => ({ page: page.documentNumber, block })));
    expect(blocks.length).toBeGreaterThan(0);
    const failures: string[] = [];
    for (let start = 0; start < blocks.length; start += maxBatchItems) {
      const chunk = blocks.slice(start, start + maxBatchItems);
      const response = await t.http
        .post('/api/evaluate')
        .set('Authorization', `Bearer ${reader}`)
        .send({ items: chunk.map(({ block }) => ({ method: block.method, inputs: block.defaults, unit: block.unit })) })
        .expect(200);
      (response.body as BatchEvaluateResponse).results.forEach((result, index) => {
        const { page, block } = chunk[index]!;
        if (!result.ok) failures.push(`${page} block "${block.caption}" (${block.method}): ${result.error.code} ${result.error.message} ${JSON.stringify(result.error.fields ?? {})}`);
      });
    }
    expect(failures).toEqual([]);
  });

  it('reloads with --seed without duplicating anything, and leaves unchanged pages alone', async () => {
    const before = await t.rowCounts();
    await t.app.get(SeedService).run('reload');
    const after = await t.rowCounts();
    expect(after.pages).toBe(before.pages);
    expect(after.page_revisions).toBe(before.page_revisions);
    expect(after.collections).toBe(before.collections);
  });
});
