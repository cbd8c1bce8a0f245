import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

// Coaxial boss Ø30 ±0.1 (datum) with bore Ø20 ±0.1 located at position Ø0.2:
// LMC with the datum at LMB gives (29.9 − 20.1 − 0.2)/2 = 4.8 at every produced size.
// Derived from ASME Y14.5M-1994 §5.3.5 (LMC to protect wall thickness) as reproduced in training texts.
const coaxialWall = {
  arrangement: 'coaxial',
  feature: { featureType: 'internal', lowerLimit: 19.9, upperLimit: 20.1 },
  datum: { featureType: 'external', lowerLimit: 29.9, upperLimit: 30.1 },
  positionTolerance: 0.2,
  toleranceModifier: 'LMC',
  datumModifier: 'LMB',
};
const inch = (mm: number) => mm / 25.4;

// Bore depth 40 ±0.10 − spacer 25 ±0.05 − ring 2 ±0.03 − shoulder 10 ±0.05: nominal 3.00, WC ±0.23,
// RSS ±0.1261 (closed forms per Scholz, "Tolerance Stack Analysis Methods", Boeing 1995).
const endPlayStack = {
  contributors: [
    { name: 'Bore depth', sense: 1, nominal: 40, plusTol: 0.1, minusTol: 0.1 },
    { name: 'Spacer', sense: -1, nominal: 25, plusTol: 0.05, minusTol: 0.05 },
    { name: 'Ring', sense: -1, nominal: 2, plusTol: 0.03, minusTol: 0.03 },
    { name: 'Shoulder', sense: -1, nominal: 10, plusTol: 0.05, minusTol: 0.05 },
  ],
  trials: 20_000,
  seed: 7,
};

describe('methods API', () => {
  let t: TestApp;
  let readerToken: string;
  beforeAll(async () => {
    t = await createTestApp();
    readerToken = await t.signIn('reader');
  });
  afterAll(async () => {
    await t?.close();
  });

  const post = (path: string, body: unknown) => t.http.post(path).set('Authorization', `Bearer ${readerToken}`).send(body as object);

  it('lists the catalog with versions, JSON schemas and outputs', async () => {
    const response = await t.http.get('/api/methods').set('Authorization', `Bearer ${readerToken}`).expect(200);
    const ids = response.body.items.map((method: { id: string }) => method.id);
    expect(ids).toEqual(expect.arrayContaining(['feature-boundary', 'wall-thickness', 'iso286-fit', 'stack-1d']));
    for (const method of response.body.items) {
      expect(method.version).toBeGreaterThanOrEqual(1);
      expect(method.inputSchema).toMatchObject({ type: 'object' });
      expect(method.outputs.length).toBeGreaterThan(0);
    }
  });

  it('evaluates one method and returns outputs, warnings and a derivation', async () => {
    const response = await post('/api/methods/wall-thickness/evaluate', { inputs: coaxialWall }).expect(200);
    expect(response.body).toMatchObject({ method: 'wall-thickness', unit: 'mm', outputs: { minWall: 4.8 } });
    expect(response.body.version).toBeGreaterThanOrEqual(1);
    expect(response.body.steps.length).toBeGreaterThan(2);
    for (const step of response.body.steps) expect(step).toEqual({ label: expect.any(String), latex: expect.any(String), value: expect.any(String) });
  });

  it('takes and returns inches when asked', async () => {
    const inInches = {
      ...coaxialWall,
      feature: { ...coaxialWall.feature, lowerLimit: inch(19.9), upperLimit: inch(20.1) },
      datum: { ...coaxialWall.datum, lowerLimit: inch(29.9), upperLimit: inch(30.1) },
      positionTolerance: inch(0.2),
    };
    const response = await post('/api/methods/wall-thickness/evaluate', { inputs: inInches, unit: 'in' }).expect(200);
    expect(response.body.unit).toBe('in');
    expect(response.body.outputs.minWall).toBeCloseTo(inch(4.8), 5);
  });

  it('answers bad inputs with 400 and one message per field', async () => {
    const response = await post('/api/methods/wall-thickness/evaluate', {
      inputs: { ...coaxialWall, feature: { ...coaxialWall.feature, lowerLimit: 20.2 }, positionTolerance: -0.1 },
    }).expect(400);
    expect(response.body.code).toBe('VALIDATION_FAILED');
    expect(Object.keys(response.body.fields)).toEqual(expect.arrayContaining(['inputs.positionTolerance']));
    expect(Object.keys(response.body.fields).some((path) => path.startsWith('inputs.feature.'))).toBe(true);
  });

  it('judges a calculator block acceptance rule beside the method checks', async () => {
    const pass = await post('/api/methods/wall-thickness/evaluate', { inputs: coaxialWall, acceptance: { output: 'minWall', operator: '>=', value: 4.8, unit: 'mm' } }).expect(200);
    expect(pass.body.verdict).toMatchObject({ pass: true, checks: [{ label: 'Acceptance rule: minWall ≥ 4.8 mm', pass: true }] });
    const fail = await post('/api/methods/wall-thickness/evaluate', { inputs: coaxialWall, acceptance: { output: 'minWall', operator: '>=', value: 5 } }).expect(200);
    expect(fail.body.verdict).toMatchObject({ pass: false, summary: 'Fails the rule minWall ≥ 5' });
    const unknownOutput = await post('/api/methods/wall-thickness/evaluate', { inputs: coaxialWall, acceptance: { output: 'minWal', operator: '>=', value: 1 } }).expect(400);
    expect(unknownOutput.body.fields).toHaveProperty(['acceptance.output']);
    const badOperator = await post('/api/methods/wall-thickness/evaluate', { inputs: coaxialWall, acceptance: { output: 'minWall', operator: '=>', value: 1 } }).expect(400);
    expect(badOperator.body.fields).toHaveProperty(['acceptance.operator']);
  });

  it('refuses a fit the standard does not define, a size out of range and an unknown unit', async () => {
    const undefinedFit = await post('/api/methods/iso286-fit/evaluate', { inputs: { nominalSize: 10, hole: 'H7', shaft: 'j9' } }).expect(400);
    expect(undefinedFit.body.fields).toHaveProperty(['inputs.shaft']);
    const tooLarge = await post('/api/methods/iso286-fit/evaluate', { inputs: { nominalSize: 3150.5, hole: 'H7' } }).expect(400);
    expect(tooLarge.body.fields).toHaveProperty(['inputs.nominalSize']);
    const badUnit = await post('/api/methods/iso286-fit/evaluate', { inputs: { nominalSize: 10, hole: 'H7' }, unit: 'cm' }).expect(400);
    expect(badUnit.body.fields).toHaveProperty(['unit']);
  });

  it('answers an unknown method with 404 and the request envelope with field errors', async () => {
    await post('/api/methods/no-such-method/evaluate', { inputs: {} }).expect(404);
    const noInputs = await post('/api/methods/wall-thickness/evaluate', { unit: 'mm' }).expect(400);
    expect(noInputs.body.fields).toHaveProperty(['inputs']);
    const extra = await post('/api/methods/wall-thickness/evaluate', { inputs: coaxialWall, colour: 'red' }).expect(400);
    expect(Object.keys(extra.body.fields).length).toBeGreaterThan(0);
  });

  it('evaluates a batch in order, each item on its own', async () => {
    const response = await post('/api/evaluate', {
      items: [
        { method: 'iso286-fit', inputs: { nominalSize: 50, hole: 'H7', shaft: 'g6' } },
        { method: 'wall-thickness', inputs: { ...coaxialWall, positionTolerance: -1 } },
        { method: 'no-such-method', inputs: {} },
        { method: 'wall-thickness', inputs: coaxialWall, unit: 'mm' },
      ],
    }).expect(200);
    const [fit, badWall, unknown, wall] = response.body.results;
    // H7/g6 at 50 mm: +0.050/+0.009 (ISO 286-2 tables; reference fit table, derived).
    expect(fit).toMatchObject({ ok: true, result: { outputs: { maxClearance: 0.05, minClearance: 0.009, fitType: 'clearance' } } });
    expect(badWall).toMatchObject({ ok: false, error: { statusCode: 400, fields: { 'inputs.positionTolerance': expect.any(String) } } });
    expect(unknown).toMatchObject({ ok: false, error: { statusCode: 404 } });
    expect(wall).toMatchObject({ ok: true, result: { outputs: { minWall: 4.8 } } });
  });

  it('refuses an empty or oversized batch', async () => {
    await post('/api/evaluate', { items: [] }).expect(400);
    const tooMany = Array.from({ length: 51 }, () => ({ method: 'iso286-fit', inputs: { nominalSize: 10, hole: 'H7' } }));
    const response = await post('/api/evaluate', { items: tooMany }).expect(400);
    expect(response.body.fields).toHaveProperty(['items']);
  });

  // The first worker-thread evaluation of a test app includes starting the worker (slow on a loaded CI machine).
  it('runs Monte Carlo in a worker thread, reproducibly for a seed', { timeout: 180_000 }, async () => {
    const first = await post('/api/methods/stack-1d/evaluate', { inputs: endPlayStack }).expect(200);
    expect(first.body.outputs.worstCase).toMatchObject({ min: 2.77, max: 3.23 });
    expect(first.body.outputs.rss.max).toBeCloseTo(3.1261, 4);
    const second = await post('/api/methods/stack-1d/evaluate', { inputs: endPlayStack }).expect(200);
    expect(second.body.outputs.monteCarlo).toEqual(first.body.outputs.monteCarlo);
  });

  it('refuses an absurd trial count with 400, without running it', async () => {
    const response = await post('/api/methods/stack-1d/evaluate', { inputs: { ...endPlayStack, trials: 1e12 } }).expect(400);
    expect(response.body.fields).toHaveProperty(['inputs.trials']);
  });
});
