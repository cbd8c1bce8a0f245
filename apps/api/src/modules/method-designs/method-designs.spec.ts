import { type DesignDefinitionInput } from '@limitbook/contracts';
import { listCalculatorBlocks, type LimitbookDocument } from '@limitbook/editor-schema';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { methodDesignRevisions, users } from '../../database/schema/index.js';
import { SeedService } from '../../seed/seed.service.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

// Squeeze = (cross-section − gland depth)/cross-section (Parker O-Ring Handbook ORD 5700, gland design; from memory).
// (3.53 − 2.80)/3.53 = 20.68 %; (3.53 − 2.90)/3.53 = 17.85 % (hand calculations).
const squeezeDefinition = (expected = 20.68): DesignDefinitionInput => ({
  name: 'Cord squeeze',
  description: 'Squeeze of one cord in one gland depth',
  inputs: [
    { name: 'cord', label: 'Cord', kind: 'length', unit: 'mm', default: 3.53, min: 0.5, max: 15 },
    { name: 'depth', label: 'Gland depth', kind: 'length', unit: 'mm', default: 2.8, min: 0.1, max: 15 },
  ],
  outputs: [{ name: 'squeeze', label: 'Squeeze', expression: '100 * (cord - depth) / cord', unit: '', decimals: 2 }],
  checks: [{ expression: 'squeeze >= 15', message: 'At least 15 %' }],
  tests: [{ label: 'ORD 5700 definition, 3.53 cord in 2.80 gland', inputs: { cord: 3.53, depth: 2.8 }, expected: { squeeze: { value: expected, tolerance: 0 } }, expectedVerdict: 'pass' }],
});

describe('in-house method designs', () => {
  let t: TestApp;
  const token: Record<'admin' | 'author' | 'reviewer' | 'reader', string> = { admin: '', author: '', reviewer: '', reader: '' };
  let reviewerId: string;
  let adminId: string;
  const as = (role: keyof typeof token) => ({
    get: (path: string) => t.http.get(path).set('Authorization', `Bearer ${token[role]}`),
    post: (path: string, body: object = {}) => t.http.post(path).set('Authorization', `Bearer ${token[role]}`).send(body),
    put: (path: string, body: object) => t.http.put(path).set('Authorization', `Bearer ${token[role]}`).send(body),
    delete: (path: string) => t.http.delete(path).set('Authorization', `Bearer ${token[role]}`),
  });

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ['admin', 'author', 'reviewer', 'reader'] as const) token[role] = await t.signIn(role);
    reviewerId = (await t.db.select().from(users).where(eq(users.email, t.demoPerson('reviewer').email)))[0]!.id;
    adminId = (await t.db.select().from(users).where(eq(users.email, t.demoPerson('admin').email)))[0]!.id;
  });
  afterAll(async () => {
    await t?.close();
  });

  /** Draft → in review → released by the reviewer; returns the released revision. */
  async function release(slug: string, author: 'author' | 'admin' = 'author') {
    const draft = await as(author).get(`/api/method-designs/${slug}/draft`).expect(200);
    await as(author).post(`/api/method-designs/${slug}/draft/submit`, { reviewerIds: [author === 'admin' ? reviewerId : reviewerId], note: 'Please check the table' }).expect(200);
    const approved = await as('reviewer').post(`/api/method-designs/${slug}/draft/approve`, { baseVersion: draft.body.version, comment: 'Checked' }).expect(200);
    return approved.body;
  }

  it('lists the demo methods released as version 1 in the catalog beside the built-ins, with a form schema', { timeout: 120_000 }, async () => {
    const catalog = await as('reader').get('/api/methods').expect(200);
    const squeeze = catalog.body.items.find((item: { id: string }) => item.id === 'house:o-ring-squeeze');
    expect(squeeze).toMatchObject({ source: 'in-house', version: 1, title: 'O-ring gland squeeze (static seal)' });
    expect(squeeze.inputSchema.properties.cord).toMatchObject({ type: 'number', default: 3.53, 'x-unit': 'mm' });
    expect(catalog.body.items.find((item: { id: string }) => item.id === 'wall-thickness')).toMatchObject({ source: 'built-in' });
    const press = await as('reader').get('/api/methods/house:press-fit-pressure').expect(200);
    expect(press.body.cautions.some((caution: string) => caution.startsWith('Safety:'))).toBe(true);

    const designs = await as('reader').get('/api/method-designs').expect(200);
    expect(designs.body.items.map((item: { id: string }) => item.id)).toEqual(expect.arrayContaining(['house:o-ring-squeeze', 'house:press-fit-pressure']));
    const design = await as('reader').get('/api/method-designs/o-ring-squeeze').expect(200);
    expect(design.body).toMatchObject({ latestVersion: 1, draft: null, released: { state: 'released', methodVersion: 1, approvedBy: { email: t.demoPerson('reviewer').email } } });
    expect(design.body.owner.email).toBe(t.demoPerson('author').email);

    // `npm run seed` again: unchanged methods stay at version 1.
    const before = await t.rowCounts();
    await t.app.get(SeedService).run('reload');
    const after = await t.rowCounts();
    expect([after.method_designs, after.method_design_revisions]).toEqual([before.method_designs, before.method_design_revisions]);
  });

  it('evaluates the demo pages’ in-house blocks through POST /api/evaluate at their pinned version', { timeout: 120_000 }, async () => {
    const items = [];
    for (const number of ['BW-STD-160', 'BW-STD-131']) {
      const page = await as('reader').get(`/api/pages/${number}`).expect(200);
      for (const block of listCalculatorBlocks(page.body.revision.document as LimitbookDocument).filter((entry) => entry.method.startsWith('house:'))) {
        items.push({ method: block.method, methodVersion: block.methodVersion, inputs: block.defaults, unit: block.unit });
      }
    }
    expect(items.map((item) => [item.method, item.methodVersion])).toEqual([
      ['house:o-ring-squeeze', 1],
      ['house:press-fit-pressure', 1],
    ]);
    const response = await as('reader').post('/api/evaluate', { items }).expect(200);
    const [squeeze, press] = response.body.results;
    // Worked example of BW-STD-160: (3.43 − 2.90)/3.43 = 15.45 %, (3.63 − 2.80)/3.63 = 22.87 % (ORD 5700 definition, by hand).
    expect(squeeze).toMatchObject({ ok: true, result: { method: 'house:o-ring-squeeze', version: 1, verdict: { pass: true }, outputs: { squeezeMin: { text: '15.45' }, squeezeMax: { text: '22.87' } } } });
    // BW-STD-131 Example 4 (Shigley 10th ed. Eq. 3-56, by hand): p ≈ 120.41 MPa, σt ≈ 138.85 MPa, F ≈ 17.43 kN.
    expect(press).toMatchObject({ ok: true, result: { version: 1, verdict: { pass: true }, outputs: { pressure: { text: '120.41 MPa' }, hubHoopStress: { text: '138.85 MPa' }, assemblyForce: { text: '17.43 kN' } } } });
    expect(press.result.steps.find((step: { label: string }) => step.label === 'Contact pressure').latex).toContain('\\mathrm{MPa}');
  });

  it('answers unknown in-house methods and versions per item, never with a 500', async () => {
    const response = await as('reader')
      .post('/api/evaluate', {
        items: [
          { method: 'house:no-such-method', inputs: {} },
          { method: 'house:o-ring-squeeze', methodVersion: 9, inputs: {} },
          { method: 'house:o-ring-squeeze', inputs: { depthMin: 'deep' } },
          { method: 'house:o-ring-squeeze', inputs: { depthMax: 99 } },
        ],
      })
      .expect(200);
    const [unknown, version, text, range] = response.body.results;
    expect(unknown).toMatchObject({ ok: false, error: { statusCode: 404 } });
    expect(version).toMatchObject({ ok: false, error: { statusCode: 404, fields: { methodVersion: 'No released version 9' } } });
    expect(text).toMatchObject({ ok: false, error: { statusCode: 400, fields: { 'inputs.depthMin': expect.stringMatching(/not a number or a quantity/) } } });
    expect(range).toMatchObject({ ok: false, error: { statusCode: 400, fields: { 'inputs.depthMax': 'Gland depth, largest must be at most 15 mm' } } });
    await as('reader').post('/api/methods/house:o-ring-squeeze/evaluate', { inputs: {}, methodVersion: 3 }).expect(404);
  });

  it('refuses to submit a method whose test table fails, naming the row, and one with no rows', { timeout: 120_000 }, async () => {
    const created = await as('author').post('/api/method-designs', { slug: 'cord-squeeze', definition: squeezeDefinition(21) }).expect(201);
    expect(created.body).toMatchObject({ id: 'house:cord-squeeze', latestVersion: null, draft: { state: 'draft', version: 1 } });
    await as('author').post('/api/method-designs', { slug: 'cord-squeeze', definition: squeezeDefinition() }).expect(409);

    const run = await as('author').post('/api/method-designs/cord-squeeze/draft/run-tests').expect(200);
    expect(run.body).toMatchObject({ pass: false, failed: 1, rows: [{ pass: false, outputs: [{ output: 'squeeze', expected: 21, actual: 20.6798866856, pass: false }] }] });
    const refused = await as('author').post('/api/method-designs/cord-squeeze/draft/submit', { reviewerIds: [reviewerId] }).expect(400);
    expect(refused.body.fields).toEqual({ 'tests.0': 'Row 1 (ORD 5700 definition, 3.53 cord in 2.80 gland) fails: squeeze expected 21, got 20.6798866856' });

    const empty = await as('author').put('/api/method-designs/cord-squeeze/draft', { baseVersion: 1, definition: { ...squeezeDefinition(), tests: [] } }).expect(200);
    expect(empty.body.version).toBe(2);
    expect((await as('author').post('/api/method-designs/cord-squeeze/draft/submit', { reviewerIds: [reviewerId] }).expect(400)).body.fields).toHaveProperty('tests');
    expect((await as('reader').get('/api/method-designs').expect(200)).body.items.map((item: { slug: string }) => item.slug)).not.toContain('cord-squeeze');
  });

  it('keeps a unit mismatch with the draft at the expression, and refuses it at submission', async () => {
    const wrongUnit = squeezeDefinition();
    wrongUnit.outputs = [{ name: 'squeeze', label: 'Squeeze', expression: 'cord - depth', unit: 'MPa', decimals: 2 }];
    const saved = await as('author').put('/api/method-designs/cord-squeeze/draft', { baseVersion: 2, definition: wrongUnit }).expect(200);
    expect(saved.body.problems).toEqual({
      'outputs.0.expression': "Result is in mm but the output's unit is MPa",
      'checks.0.expression': 'In squeeze >= 15: cannot combine a quantity in mm (length) and the plain number 15',
    });
    expect(saved.body.tex['outputs.0.expression']).toBe('cord- depth');
    const submit = await as('author').post('/api/method-designs/cord-squeeze/draft/submit', { reviewerIds: [reviewerId] }).expect(400);
    expect(submit.body.fields).toMatchObject({ 'outputs.0.expression': "Result is in mm but the output's unit is MPa" });
    const preview = await as('author').post('/api/method-designs/preview', { definition: wrongUnit, values: { depth: 3 } }).expect(400);
    expect(preview.body).toMatchObject({ fields: { 'definition.outputs.0.expression': "Result is in mm but the output's unit is MPa" }, tex: { 'outputs.0.expression': 'cord- depth' } });
    await as('author').put('/api/method-designs/cord-squeeze/draft', { baseVersion: 2, definition: squeezeDefinition() }).expect(409);
  });

  it('previews an unsaved definition with values and the TeX of every expression', async () => {
    const preview = await as('author').post('/api/method-designs/preview', { definition: squeezeDefinition(), values: { depth: '0.11 in' } }).expect(200);
    // 0.11 in = 2.794 mm (NIST SP 811); (3.53 − 2.794)/3.53 = 20.85 %.
    expect(preview.body.result.outputs.squeeze).toMatchObject({ text: '20.85', unit: null });
    expect(preview.body.result.verdict).toMatchObject({ pass: true });
    expect(preview.body.tex).toEqual({ 'outputs.0.expression': expect.stringContaining('\\frac'), 'checks.0.expression': expect.stringContaining('\\geq') });
    const badValue = await as('author').post('/api/method-designs/preview', { definition: squeezeDefinition(), values: { depth: 40, colour: 1 } }).expect(400);
    expect(badValue.body.fields).toEqual({ 'values.depth': 'Gland depth must be at most 15 mm', 'values.colour': 'colour is not an input of this method' });
    const badKind = await as('author').post('/api/method-designs/preview', { definition: { ...squeezeDefinition(), inputs: [{ name: 'cord', label: 'Cord', kind: 'force', unit: 'mm' }] } }).expect(400);
    expect(badKind.body.fields['definition.inputs.0.unit']).toMatch(/mm is not a unit of force/);
    await as('reader').post('/api/method-designs/preview', { definition: squeezeDefinition() }).expect(403);
  });

  it('refuses every hostile formula through preview, save and run-tests with a 400 and a field; nothing runs, no 500, no hang', { timeout: 300_000 }, async () => {
    const { harmlessErrorFormulaExpressions, refusedFormulaExpressions } = await import('@limitbook/engine/testing');
    const draft = await as('author').get('/api/method-designs/cord-squeeze/draft').expect(200);
    const [row] = await t.db.select().from(methodDesignRevisions).where(eq(methodDesignRevisions.id, draft.body.id));
    const started = performance.now();
    for (const expression of [...refusedFormulaExpressions, ...harmlessErrorFormulaExpressions]) {
      const hostile = squeezeDefinition();
      hostile.intermediates = [{ name: 'x', label: 'x', expression, unit: '', decimals: 3 }];
      const preview = await as('author').post('/api/method-designs/preview', { definition: hostile });
      expect(preview.status, expression).toBe(400);
      expect(preview.body.fields['definition.intermediates.0.expression'], expression).toEqual(expect.any(String));
      if (refusedFormulaExpressions.includes(expression)) {
        const save = await as('author').put('/api/method-designs/cord-squeeze/draft', { baseVersion: draft.body.version, definition: hostile });
        expect(save.status, expression).toBe(400);
        // Over-long expressions are refused by the request schema, everything else by the sandbox.
        expect(save.body.fields['definition.intermediates.0.expression'], expression).toMatch(/^Refused|at most 500 characters/);
      }
      // A stored definition (say from before a sandbox rule existed) is refused by the test runner too.
      await t.db.update(methodDesignRevisions).set({ definition: { ...row!.definition, intermediates: hostile.intermediates as never } }).where(eq(methodDesignRevisions.id, row!.id));
      const tests = await as('author').post('/api/method-designs/cord-squeeze/draft/run-tests');
      expect(tests.status, expression).toBe(400);
      expect(tests.body.fields['intermediates.0.expression'], expression).toEqual(expect.any(String));
    }
    await t.db.update(methodDesignRevisions).set({ definition: row!.definition }).where(eq(methodDesignRevisions.id, row!.id));
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(performance.now() - started).toBeLessThan(200_000);
    const after = await as('author').get('/api/method-designs/cord-squeeze/draft').expect(200);
    expect(after.body.version).toBe(draft.body.version);
    await t.http.get('/api/health').expect(200);
  });

  it('runs review per role: readers see no drafts, authors cannot approve their own, released versions are immutable', { timeout: 120_000 }, async () => {
    const draft = await as('author').get('/api/method-designs/cord-squeeze/draft').expect(200);
    await as('author').put('/api/method-designs/cord-squeeze/draft', { baseVersion: draft.body.version, definition: squeezeDefinition() }).expect(200);
    await as('reader').get('/api/method-designs/cord-squeeze/draft').expect(403);
    await as('reader').get('/api/method-designs/cord-squeeze').expect(403);
    expect((await as('author').post('/api/method-designs/cord-squeeze/draft/run-tests').expect(200)).body).toMatchObject({ pass: true, passed: 1 });
    await as('author').post('/api/method-designs/cord-squeeze/draft/submit', { reviewerIds: [(await t.db.select().from(users).where(eq(users.email, t.demoPerson('author').email)))[0]!.id] }).expect(400);
    const submitted = await as('author').post('/api/method-designs/cord-squeeze/draft/submit', { reviewerIds: [reviewerId, adminId] }).expect(200);
    expect(submitted.body).toMatchObject({ state: 'in_review', review: { note: null } });
    expect((await t.readMail(t.demoPerson('reviewer').email))[0]!.subject).toBe('Review requested: house:cord-squeeze Cord squeeze');
    await as('reviewer').get('/api/method-designs/cord-squeeze/draft').expect(200);
    await as('author').put('/api/method-designs/cord-squeeze/draft', { baseVersion: submitted.body.version, definition: squeezeDefinition() }).expect(409);
    await as('author').post('/api/method-designs/cord-squeeze/draft/approve', { baseVersion: submitted.body.version }).expect(403);
    await as('reviewer').post('/api/method-designs/cord-squeeze/draft/send-back', {}).expect(400);
    const back = await as('reviewer').post('/api/method-designs/cord-squeeze/draft/send-back', { comment: 'Name the source of the 15 % limit' }).expect(200);
    expect(back.body).toMatchObject({ state: 'draft', review: { comment: 'Name the source of the 15 % limit' } });
    await as('author').post('/api/method-designs/cord-squeeze/draft/submit', { reviewerIds: [reviewerId] }).expect(200);
    await as('author').post('/api/method-designs/cord-squeeze/draft/withdraw').expect(200);
    const again = await as('author').post('/api/method-designs/cord-squeeze/draft/submit', { reviewerIds: [reviewerId] }).expect(200);
    await as('reviewer').post('/api/method-designs/cord-squeeze/draft/approve', { baseVersion: again.body.version + 1 }).expect(409);
    const released = await as('reviewer').post('/api/method-designs/cord-squeeze/draft/approve', { baseVersion: again.body.version, comment: 'Checked against ORD 5700' }).expect(200);
    expect(released.body).toMatchObject({ state: 'released', methodVersion: 1, approvedBy: { email: t.demoPerson('reviewer').email }, problems: {} });

    // Released: no route changes it.
    await as('author').put('/api/method-designs/cord-squeeze/draft', { baseVersion: again.body.version, definition: squeezeDefinition(99) }).expect(409);
    await as('author').delete('/api/method-designs/cord-squeeze/draft').expect(409);
    await as('author').post('/api/method-designs/cord-squeeze/draft/submit', { reviewerIds: [reviewerId] }).expect(409);
    await as('reviewer').post('/api/method-designs/cord-squeeze/draft/approve', { baseVersion: 1 }).expect(409);
    await as('author').post('/api/method-designs/cord-squeeze/draft/run-tests').expect(404);
    expect((await as('reader').get('/api/method-designs/cord-squeeze/versions/1').expect(200)).body.definition.tests[0].expected.squeeze.value).toBe(20.68);
    expect((await as('reader').get('/api/method-designs/cord-squeeze').expect(200)).body).toMatchObject({ latestVersion: 1, draft: null });
    await as('reader').get('/api/method-designs/cord-squeeze/versions/2').expect(404);
    await as('reader').get('/api/method-designs/cord-squeeze/versions/first').expect(404);
  });

  it('releases version 2 superseding 1, compares them, and keeps pinned evaluations on version 1', { timeout: 120_000 }, async () => {
    await as('author').post('/api/method-designs/cord-squeeze/draft').expect(201);
    await as('author').post('/api/method-designs/cord-squeeze/draft').expect(409);
    const v2 = squeezeDefinition();
    // Version 2 reports squeeze as a fraction; (3.53 − 2.80)/3.53 = 0.2068 (same definition, by hand).
    v2.outputs = [{ name: 'squeeze', label: 'Squeeze ratio', expression: '(cord - depth) / cord', unit: '', decimals: 4 }];
    v2.checks = [{ expression: 'squeeze >= 0.15', message: 'At least 15 %' }];
    v2.tests = [{ label: 'ORD 5700 definition', inputs: { cord: 3.53, depth: 2.8 }, expected: { squeeze: { value: 0.2068, tolerance: 0 } }, expectedVerdict: 'pass' }];
    const draft = await as('author').get('/api/method-designs/cord-squeeze/draft').expect(200);
    await as('author').put('/api/method-designs/cord-squeeze/draft', { baseVersion: draft.body.version, definition: v2 }).expect(200);
    const released = await release('cord-squeeze');
    expect(released).toMatchObject({ methodVersion: 2, state: 'released' });

    const versions = await as('reader').get('/api/method-designs/cord-squeeze/versions').expect(200);
    expect(versions.body.items.map((item: { methodVersion: number; state: string }) => [item.methodVersion, item.state])).toEqual([
      [2, 'released'],
      [1, 'superseded'],
    ]);
    const compare = await as('reader').get('/api/method-designs/cord-squeeze/compare?from=1&to=2').expect(200);
    const output = compare.body.changes.find((change: { section: string }) => change.section === 'outputs');
    expect(output).toMatchObject({ key: 'squeeze', change: 'changed' });
    expect(output.rows.map((row: { field: string }) => row.field).sort()).toEqual(['decimals', 'expression', 'label']);
    expect(output.text).toEqual(expect.arrayContaining([{ kind: 'removed', text: expect.stringContaining('100') }]));
    expect(compare.body.changes.filter((change: { section: string }) => change.section === 'tests')).toHaveLength(1);
    await as('reader').get('/api/method-designs/cord-squeeze/compare?from=1&to=draft').expect(404);

    const evaluated = await as('reader')
      .post('/api/evaluate', {
        items: [
          { method: 'house:cord-squeeze', methodVersion: 1, inputs: { depth: 2.8 } },
          { method: 'house:cord-squeeze', inputs: { depth: 2.8 } },
          { method: 'house:cord-squeeze', methodVersion: null, inputs: { depth: 2.8 } },
        ],
      })
      .expect(200);
    expect(evaluated.body.results.map((result: { result: { version: number; outputs: { squeeze: { text: string } } } }) => [result.result.version, result.result.outputs.squeeze.text])).toEqual([
      [1, '20.68'],
      [2, '0.2068'],
      [2, '0.2068'],
    ]);

    const usage = await as('reader').get('/api/methods/house:cord-squeeze/usage').expect(200);
    expect(usage.body).toMatchObject({ source: 'in-house', latestVersion: 2, usages: [], tests: [{ label: 'ORD 5700 definition' }] });
  });

  it('refuses approval by an admin who wrote the version, and deletes a never-released method with its draft', { timeout: 60_000 }, async () => {
    await as('admin').post('/api/method-designs', { slug: 'admin-squeeze', definition: squeezeDefinition() }).expect(201);
    const submitted = await as('admin').post('/api/method-designs/admin-squeeze/draft/submit', { reviewerIds: [reviewerId] }).expect(200);
    const own = await as('admin').post('/api/method-designs/admin-squeeze/draft/approve', { baseVersion: submitted.body.version }).expect(403);
    expect(own.body.message).toMatch(/another reviewer or admin/);
    await as('admin').delete('/api/method-designs/admin-squeeze/draft').expect(409);
    await as('admin').post('/api/method-designs/admin-squeeze/draft/withdraw').expect(200);
    await as('admin').delete('/api/method-designs/admin-squeeze/draft').expect(204);
    await as('admin').get('/api/method-designs/admin-squeeze').expect(404);
    const hostile = squeezeDefinition();
    hostile.outputs = [{ name: 'squeeze', label: 'Squeeze', expression: 'cos.constructor("return process")', unit: '', decimals: 2 }];
    const refused = await as('author').post('/api/method-designs', { slug: 'hostile', definition: hostile }).expect(400);
    expect(refused.body.fields['definition.outputs.0.expression']).toMatch(/^Refused/);
    await as('author').get('/api/method-designs/hostile').expect(404);
  });

  it('lets an admin restore an earlier version as a new draft', async () => {
    await as('author').post('/api/method-designs/cord-squeeze/versions/1/restore').expect(403);
    const restored = await as('admin').post('/api/method-designs/cord-squeeze/versions/1/restore').expect(200);
    expect(restored.body).toMatchObject({ state: 'draft', methodVersion: null, restoredFromVersion: 1, problems: {} });
    expect(restored.body.definition.outputs[0].expression).toBe('100 * (cord - depth) / cord');
    await as('admin').post('/api/method-designs/cord-squeeze/versions/1/restore').expect(409);
    const compare = await as('author').get('/api/method-designs/cord-squeeze/compare?from=2&to=draft').expect(200);
    expect(compare.body.to).toMatchObject({ state: 'draft', methodVersion: null });
    await as('author').delete('/api/method-designs/cord-squeeze/draft').expect(204);
    expect((await as('author').get('/api/method-designs/cord-squeeze').expect(200)).body).toMatchObject({ latestVersion: 2, draft: null });
  });

  it('lists blocks pinned to an older version, and moves them forward through the page draft', { timeout: 180_000 }, async () => {
    // Version 2 of the demo squeeze method: same formulas, one more reference.
    await as('author').post('/api/method-designs/o-ring-squeeze/draft').expect(201);
    const draft = await as('author').get('/api/method-designs/o-ring-squeeze/draft').expect(200);
    const v2 = { ...draft.body.definition, references: [...draft.body.definition.references, 'Brackwater test report TR-160-01 (demo)'] };
    await as('author').put('/api/method-designs/o-ring-squeeze/draft', { baseVersion: draft.body.version, definition: v2 }).expect(200);
    await release('o-ring-squeeze');

    const page = await as('author').get('/api/pages/BW-STD-160').expect(200);
    const lagging = await as('reader').get(`/api/pages/${page.body.id}/lagging-blocks`).expect(200);
    expect(lagging.body).toMatchObject({ state: 'released', items: [{ blockId: 'e5454df7-31f7-4f21-abc2-cabb56843d6f', method: 'house:o-ring-squeeze', pinnedVersion: 1, latestVersion: 2 }] });

    // The page stays on version 1 until its draft is reviewed.
    const pinned = await as('reader').post('/api/evaluate', { items: [{ method: 'house:o-ring-squeeze', methodVersion: 1, inputs: {} }] }).expect(200);
    expect(pinned.body.results[0].result.version).toBe(1);

    await as('reader').post(`/api/pages/${page.body.id}/lagging-blocks/move-forward`, { blockIds: ['e5454df7-31f7-4f21-abc2-cabb56843d6f'] }).expect(403);
    const wrong = await as('author').post(`/api/pages/${page.body.id}/lagging-blocks/move-forward`, { blockIds: ['13ea2764-b63f-4999-bde1-cc39d1c2c84c'] }).expect(400);
    expect(wrong.body.fields).toHaveProperty(['blockIds.0']);
    const moved = await as('author').post(`/api/pages/${page.body.id}/lagging-blocks/move-forward`, { blockIds: ['e5454df7-31f7-4f21-abc2-cabb56843d6f'] }).expect(200);
    expect(moved.body).toMatchObject({ pageId: page.body.id, moved: [{ blockId: 'e5454df7-31f7-4f21-abc2-cabb56843d6f', from: 1, to: 2 }] });

    const after = await as('author').get(`/api/pages/${page.body.id}?view=draft`).expect(200);
    expect(after.body.revision).toMatchObject({ state: 'draft', id: moved.body.revisionId, version: moved.body.version });
    expect(listCalculatorBlocks(after.body.revision.document as LimitbookDocument)[0]).toMatchObject({ method: 'house:o-ring-squeeze', methodVersion: 2 });
    // Released revision untouched; the editor's view of lagging blocks is the draft, now empty.
    const released = await as('reader').get(`/api/pages/${page.body.id}`).expect(200);
    expect(listCalculatorBlocks(released.body.revision.document as LimitbookDocument)[0]!.methodVersion).toBe(1);
    expect((await as('author').get(`/api/pages/${page.body.id}/lagging-blocks`).expect(200)).body).toMatchObject({ state: 'draft', items: [] });

    const usage = await as('author').get('/api/methods/house:o-ring-squeeze/usage').expect(200);
    expect(usage.body.usages.map((entry: { state: string; methodVersion: number }) => [entry.state, entry.methodVersion]).sort()).toEqual([
      ['draft', 2],
      ['released', 1],
    ]);
    expect((await as('reader').get('/api/methods/house:o-ring-squeeze/usage').expect(200)).body.usages).toHaveLength(1);
    await as('reader').get('/api/methods/wall-thickness/usage').expect(200);
  });

  it('saves a record from an in-house block of a released page', { timeout: 60_000 }, async () => {
    const page = await as('reader').get('/api/pages/BW-STD-131').expect(200);
    const block = listCalculatorBlocks(page.body.revision.document as LimitbookDocument).find((entry) => entry.method === 'house:press-fit-pressure')!;
    const record = await as('reader')
      .post('/api/records', { pageId: page.body.id, revisionId: page.body.revision.id, blockId: block.blockId, inputs: { ...block.defaults, interference: 0.018 } })
      .expect(201);
    expect(record.body).toMatchObject({ method: 'house:press-fit-pressure', methodVersion: 1 });
    // Smallest H7/p6 interference at Ø16 is 0.018 mm (ISO 286-2, reference fit table): p scales with δ, 120.41 × 18/29 = 74.74 MPa.
    expect(record.body.outputs.pressure.text).toBe('74.74 MPa');

    // BW-STD-160 pins version 1 although version 2 is out (released in the test above): the record says 1.
    const sealPage = await as('reader').get('/api/pages/BW-STD-160').expect(200);
    const sealBlock = listCalculatorBlocks(sealPage.body.revision.document as LimitbookDocument)[0]!;
    const sealRecord = await as('reader')
      .post('/api/records', { pageId: sealPage.body.id, revisionId: sealPage.body.revision.id, blockId: sealBlock.blockId, inputs: sealBlock.defaults })
      .expect(201);
    expect(sealRecord.body).toMatchObject({ method: 'house:o-ring-squeeze', methodVersion: 1, verdict: { pass: true } });
    const refused = await as('reader')
      .post('/api/records', { pageId: sealPage.body.id, revisionId: sealPage.body.revision.id, blockId: sealBlock.blockId, inputs: { ...sealBlock.defaults, depthMax: 99 } })
      .expect(400);
    expect(refused.body.fields).toHaveProperty(['inputs.depthMax']);

    // The impact check re-runs the record under the draft, whose block was moved to version 2 (same formulas: unaffected).
    const draft = await as('author').get(`/api/pages/${sealPage.body.id}?view=draft`).expect(200);
    const impact = await as('author').post(`/api/pages/${sealPage.body.id}/impact`, { fromRevisionId: sealPage.body.revision.id, toRevisionId: draft.body.revision.id }).expect(201);
    expect(impact.body).toMatchObject({ recordsChecked: 1, affected: [], changedBlocks: [{ blockId: sealBlock.blockId, changes: ['methodVersion'] }] });
  });
});
