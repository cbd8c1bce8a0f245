import { type CalculationRecord, type Collection, type ErrorBody, type EvaluationResult, type Page, type TableImportResult } from '@limitbook/contracts';
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { releasePage } from '../library/testing/release-page.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

const blockId = '2b7c9e4a-51d3-4f0e-8a6b-93c1d2e4f5a7';
const formulaLabel = "=cmd|' /C calc'!A0";

const goodCsv = [
  'Label,Basic X,Basic Y,Measured X,Measured Y,Size',
  'H1,50,0,50.03,0.04,10.05',
  'H2,0,50,0.01,50.02,10.02',
  'H3,-50,0,-49.98,0.01,10.04',
  'H4,0,-50,0,-50.03,10.03',
  '',
].join('\r\n');

describe('CSV import of table inputs over HTTP', () => {
  let t: TestApp;
  let reader: string;
  let author: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const importCsv = (content: string | Buffer, path = 'position-check/tables/features', query = '', name = 'holes.csv', token: string | null = reader) => {
    const request = t.http.post(`/api/methods/${path}/import${query}`);
    if (token) request.set(as(token));
    return request.attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), { filename: name, contentType: 'text/csv' });
  };

  beforeAll(async () => {
    t = await createTestApp();
    [reader, author] = await Promise.all([t.signIn('reader'), t.signIn('author')]);
  });
  afterAll(async () => {
    await t?.close();
  });

  it('reads a good file into rows, headers matched by alias and case, nothing stored', async () => {
    const before = await t.rowCounts();
    const body = (await importCsv(goodCsv).expect(200)).body as TableImportResult;
    expect(body.problems).toEqual([]);
    expect(body.unit).toBe('mm');
    expect(body.columns.map((column) => column.field)).toEqual(['label', 'basicX', 'basicY', 'measuredX', 'measuredY', 'actualSize']);
    expect(body.rows).toHaveLength(4);
    expect(body.rows[0]).toEqual({ label: 'H1', basicX: 50, basicY: 0, measuredX: 50.03, measuredY: 0.04, actualSize: 10.05 });
    expect(await t.rowCounts()).toEqual(before);
  });

  it('reads the demo CMM report of BW-INS-202, which then conforms as measured', async () => {
    const demoCsv = await readFile(fileURLToPath(new URL('../../../../../content/demo/inspection-data/bw-ins-202-bv40-end-cover-sn0419.csv', import.meta.url)));
    const body = (await importCsv(demoCsv, undefined, '', 'bw-ins-202-bv40-end-cover-sn0419.csv').expect(200)).body as TableImportResult;
    expect(body.problems).toEqual([]);
    expect(body.rows.map((row) => row.label)).toEqual(['H1', 'H2', 'H3', 'H4', 'H5', 'H6', 'H7', 'H8']);
    const inputs = { featureType: 'internal', lowerLimit: 10.5, upperLimit: 10.68, positionTolerance: 0.25, toleranceModifier: 'MMC', features: body.rows };
    const result = (await t.http.post('/api/methods/position-check/evaluate').set(as(reader)).send({ inputs, unit: 'mm' }).expect(200)).body as EvaluationResult;
    expect(result.outputs).toMatchObject({ conformsAsMeasured: true, patternConforms: true });
  });

  it('converts lengths from a unit column and from header suffixes to the unit asked for', async () => {
    const csv = ['label,basicX [in],basicY (in),x,y,size,unit', 'H1,1,2,25.4,50.8,10,mm', 'H2,0.5,0,0.5,0.001,0.4,in'].join('\n');
    const body = (await importCsv(csv, undefined, '?unit=mm').expect(200)).body as TableImportResult;
    expect(body.problems).toEqual([]);
    // 1 in = 25.4 mm exactly (ISO 31-1 / the international inch of 1959).
    expect(body.rows[0]).toMatchObject({ basicX: 25.4, basicY: 50.8, measuredX: 25.4, measuredY: 50.8, actualSize: 10 });
    expect(body.rows[1]).toMatchObject({ basicX: 12.7, basicY: 0, measuredX: 12.7, measuredY: 0.0254, actualSize: 10.16 });
    const inches = (await importCsv(csv, undefined, '?unit=in').expect(200)).body as TableImportResult;
    expect(inches.rows[0]).toMatchObject({ basicX: 1, measuredX: 1, actualSize: 0.393700787402 });
  });

  it('reads stack-up contributors, with signs and tolerances', async () => {
    const csv = ['Name;Sense;Nominal;+Tol;-Tol;Distribution', 'Bore depth;+;40;0,1;0,1;normal', 'Spacer;-1;25;0,05;0,05;uniform'].join('\n');
    const body = (await importCsv(csv, 'stack-1d/tables/contributors').expect(200)).body as TableImportResult;
    expect(body.problems).toEqual([]);
    expect(body.rows).toEqual([
      { name: 'Bore depth', sense: 1, nominal: 40, plusTol: 0.1, minusTol: 0.1, distribution: 'normal' },
      { name: 'Spacer', sense: -1, nominal: 25, plusTol: 0.05, minusTol: 0.05, distribution: 'uniform' },
    ]);
  });

  it('refuses wrong or missing columns with the expected columns named', async () => {
    const body = (await importCsv('label,north,east,size\nH1,1,2,10\n').expect(400)).body as ErrorBody;
    expect(body.code).toBe('VALIDATION_FAILED');
    expect(body.fields?.file).toMatch(/missing columns basicX, basicY, measuredX, measuredY/);
    expect(body.fields?.file).toMatch(/Expected columns: label, basicX, basicY, measuredX, measuredY, actualSize/);
    const twice = (await importCsv('label,basicX,basicY,x,measured x,y,size\nH1,0,0,0,0,0,10\n').expect(400)).body as ErrorBody;
    expect(twice.fields?.file).toMatch(/both read as measuredX/);
  });

  it('names the line and column of a wrong unit', async () => {
    const header = (await importCsv('label,basicX [cm],basicY,x,y,size\nH1,0,0,0,0,10\n').expect(400)).body as ErrorBody;
    expect(header.fields?.file).toBe('Line 1, column “basicX [cm]”: unit “cm” is not mm or in.');
    const row = (await importCsv('label,basicX,basicY,x,y,size,unit\nH1,0,0,0,0,10,mm\nH2,0,0,0,0,10,cm\nH3,0,0,0,0,10,\n').expect(200)).body as TableImportResult;
    expect(row.problems).toEqual([{ line: 3, field: 'unit', message: 'Unit “cm” is not mm or in' }]);
    expect(row.rows.map((r) => r.label)).toEqual(['H1', 'H3']);
  });

  it('reports the exact line of a bad row in the middle and keeps the others', async () => {
    // A quoted label spanning two lines and a blank line shift the later line numbers: they must still be exact.
    const csv = ['label,basicX,basicY,measuredX,measuredY,actualSize', 'H1,50,0,50.03,0.04,10.05', '"H2', 'second line",0,50,0.01,50.02,10.02', '', 'H3,-50,0,abc,0.01,10.04', 'H4,0,-50,0,-50.03,-1', 'H5,0,0,0,0,10'].join('\n');
    const body = (await importCsv(csv).expect(200)).body as TableImportResult;
    expect(body.rows.map((r) => r.label)).toEqual(['H1', 'H2\nsecond line', 'H5']);
    expect(body.problems).toEqual([
      { line: 6, field: 'measuredX', message: 'Measured X must be a number (read “abc”)' },
      { line: 7, field: 'actualSize', message: 'Actual size must be greater than zero' },
    ]);
  });

  it('refuses a file over 1 MB with 413 without hanging', async () => {
    const huge = Buffer.alloc(10 * 1024 * 1024, 'H1,0,0,0,0,10\n');
    const started = Date.now();
    const body = (await importCsv(huge).expect(413)).body as ErrorBody;
    expect(body).toMatchObject({ code: 'PAYLOAD_TOO_LARGE', message: 'CSV imports may be at most 1 MB; split the table or remove unused columns.' });
    expect(Date.now() - started).toBeLessThan(20_000);
    // The server still answers afterwards.
    await importCsv(goodCsv).expect(200);
  });

  it('refuses empty, binary and spreadsheet files, and no file, with 400', async () => {
    expect(((await importCsv('').expect(400)).body as ErrorBody).fields?.file).toBe('The file is empty');
    expect(((await importCsv(' \r\n').expect(400)).body as ErrorBody).fields?.file).toBe('The file is empty');
    const png = Buffer.from('89504e470d0a1a0a0000000d4948445200000001000000010806000000', 'hex');
    expect(((await importCsv(png, undefined, '', 'holes.csv').expect(400)).body as ErrorBody).fields?.file).toMatch(/not a CSV table: it holds image\/png data/);
    const zip = Buffer.from('504b0304140006000800000021000000000000000000000000001300000078', 'hex');
    expect(((await importCsv(zip, undefined, '', 'holes.xlsx').expect(400)).body as ErrorBody).fields?.file).toMatch(/not a CSV|spreadsheet/);
    expect(((await importCsv(Buffer.from([0x48, 0x31, 0x00, 0x2c])).expect(400)).body as ErrorBody).message).toMatch(/binary/);
    expect(((await importCsv('label,basicX,basicY,x,y,size\n').expect(400)).body as ErrorBody).message).toMatch(/no rows/);
    const none = await t.http.post('/api/methods/position-check/tables/features/import').set(as(reader)).send({ file: 'x' }).expect(400);
    expect((none.body as ErrorBody).fields).toEqual({ file: 'A CSV file is required' });
  });

  it('answers 404 for a method or input without an importable table, 400 for a bad unit, 401 signed out', async () => {
    await importCsv(goodCsv, 'iso286-fit/tables/hole').expect(404);
    await importCsv(goodCsv, 'position-check/tables/datum').expect(404);
    await importCsv(goodCsv, 'no-such-method/tables/features').expect(404);
    expect(((await importCsv(goodCsv, undefined, '?unit=cm').expect(400)).body as ErrorBody).fields).toHaveProperty('unit');
    await importCsv(goodCsv, undefined, '', 'holes.csv', null).expect(401);
  });

  it('keeps a formula-like label as text through import, evaluation, a saved record and its CSV export', async () => {
    const csv = ['label,basicX,basicY,measuredX,measuredY,actualSize', `"${formulaLabel}",0,0,0.2,0,10`, 'H2,50,0,50,0,10'].join('\n');
    const imported = (await importCsv(csv).expect(200)).body as TableImportResult;
    expect(imported.rows[0]!.label).toBe(formulaLabel);

    const inputs = { featureType: 'internal', lowerLimit: 10, upperLimit: 10.2, positionTolerance: 0.1, toleranceModifier: 'MMC', features: imported.rows };
    const evaluated = (await t.http.post('/api/methods/position-check/evaluate').set(as(reader)).send({ inputs, unit: 'mm' }).expect(200)).body as EvaluationResult;
    expect((evaluated.outputs.features as { label: string }[])[0]!.label).toBe(formulaLabel);

    const reviewer = await t.signIn('reviewer');
    const collection = (await t.http.post('/api/collections').set(as(author)).send({ key: 'test-measurements', name: 'Measurement tests' }).expect(201)).body as Collection;
    const block = { type: 'calculatorBlock', attrs: { blockId, method: 'position-check', unit: 'mm', defaults: inputs, locked: [], caption: 'Hole pattern' } };
    let page = (
      await t.http
        .post('/api/pages')
        .set(as(author))
        .send({ documentNumber: 'TST-MEAS-001', collectionId: collection.id, title: 'Hole pattern check', document: { type: 'doc', content: [block] } })
        .expect(201)
    ).body as Page;
    page = await releasePage(t, page.id, { submitter: author, approver: reviewer });
    const record = (
      await t.http.post('/api/records').set(as(reader)).send({ pageId: page.id, revisionId: page.published!.id, blockId, inputs, reference: { note: formulaLabel } }).expect(201)
    ).body as CalculationRecord;
    expect((record.outputs.features as { label: string }[])[0]!.label).toBe(formulaLabel);

    const exported = await t.http.get(`/api/records/export.csv?ids=${record.id}`).set(as(reader)).expect(200);
    const table = Papa.parse<string[]>(exported.text as string, { skipEmptyLines: true }).data;
    const [header, row] = table as [string[], string[]];
    // No cell a spreadsheet would run as a formula; the note and the label come back as text.
    for (const cell of row) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
    expect(row[header.indexOf('note')]).toBe(`'${formulaLabel}`);
    expect((JSON.parse(row[header.indexOf('outputs')]!) as { features: { label: string }[] }).features[0]!.label).toBe(formulaLabel);
  });
});
