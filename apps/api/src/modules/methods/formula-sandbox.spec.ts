import { harmlessErrorFormulaExpressions, refusedFormulaExpressions } from '@limitbook/engine/testing';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

// The engine's hostile list, sent over HTTP: every item must come back as a 400 naming the
// expression, the worker must survive, and the server must keep answering.
describe('formula sandbox over HTTP', () => {
  let t: TestApp;
  let token: string;
  beforeAll(async () => {
    t = await createTestApp();
    token = await t.signIn('reader');
  });
  afterAll(async () => {
    await t?.close();
  });

  const evaluate = (expression: string) =>
    t.http
      .post('/api/methods/formula/evaluate')
      .set('Authorization', `Bearer ${token}`)
      .send({ inputs: { expressions: [`x = ${expression}`], values: { a: '2 mm', b: 3 } } });

  it('refuses every hostile expression with a 400 at the expression', { timeout: 180_000 }, async () => {
    for (const expression of [...refusedFormulaExpressions, ...harmlessErrorFormulaExpressions]) {
      const response = await evaluate(expression);
      expect(response.status, expression).toBe(400);
      expect(response.body.code, expression).toBe('VALIDATION_FAILED');
      expect(response.body.fields['inputs.expressions.0'], expression).toEqual(expect.any(String));
    }
    await t.http.get('/api/health').expect(200);
  });

  it('refuses a hostile batch item without failing its neighbours', { timeout: 180_000 }, async () => {
    const response = await t.http
      .post('/api/evaluate')
      .set('Authorization', `Bearer ${token}`)
      .send({
        items: [
          { method: 'formula', inputs: { expressions: ['x = cos.constructor("return process")()'] } },
          { method: 'formula', inputs: { expressions: ['area = pi * (d / 2)^2'], values: { d: '10 mm' } } },
        ],
      })
      .expect(200);
    expect(response.body.results[0]).toMatchObject({ ok: false, error: { statusCode: 400 } });
    // π·5² = 78.539816… mm² (common practice).
    expect(response.body.results[1]).toMatchObject({ ok: true, result: { outputs: { area: { unit: 'mm^2' } } } });
    expect(response.body.results[1].result.outputs.area.value).toBeCloseTo(78.5398, 4);
  });
});
