import { inflateSync } from 'node:zlib';
import { type CalculationRecord, type Collection, type ErrorBody, type ImpactReport, type Page, type RecordImpactList, type RecordList, type ReleaseImpact } from '@limitbook/contracts';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { impactReports } from '../../database/schema/index.js';
import { releasePage } from '../library/testing/release-page.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { RecordsService } from './records.service.js';

// Coaxial boss Ø30 ±0.1 (datum at LMB) with bore located at position Ø0.2 at LMC:
// minWall = (datum LMC − bore LMC − 0.2) / 2, e.g. (29.9 − 20.1 − 0.2)/2 = 4.8.
// Derived from ASME Y14.5M-1994 §5.3.5 (LMC to protect wall thickness), as in methods.controller.spec.ts.
const blockId = '6d1f0b52-3c7a-4e8d-9b21-5a4c3e2f1d90';
const lockedDefaults = { arrangement: 'coaxial', positionTolerance: 0.2, toleranceModifier: 'LMC', datumModifier: 'LMB' };
const wallBlock = (minWall: number) => ({
  type: 'calculatorBlock',
  attrs: {
    blockId,
    method: 'wall-thickness',
    unit: 'mm',
    defaults: {
      ...lockedDefaults,
      feature: { featureType: 'internal', lowerLimit: 19.9, upperLimit: 20.1 },
      datum: { featureType: 'external', lowerLimit: 29.9, upperLimit: 30.1 },
    },
    locked: ['arrangement', 'positionTolerance', 'toleranceModifier', 'datumModifier'],
    acceptance: { output: 'minWall', operator: '>=', value: minWall, unit: 'mm' },
    caption: 'Port to bore wall',
  },
});
const doc = (...content: object[]) => ({ type: 'doc', content });
const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });

/** Unlocked inputs for a wall of (datumLow − boreHigh − 0.2)/2. */
const sized = (boreHigh: number, datumLow = 29.9) => ({
  feature: { featureType: 'internal', lowerLimit: 19.9, upperLimit: boreHigh },
  datum: { featureType: 'external', lowerLimit: datumLow, upperLimit: datumLow + 0.2 },
});

/** The text a PDF shows: content streams inflated, then the strings of its Tj/TJ operators joined per operator. */
function pdfText(pdf: Buffer): string {
  const raw = pdf.toString('latin1');
  const lines: string[] = [];
  for (const match of raw.matchAll(/stream\r?\n([\s\S]*?)\r?\nendstream/g)) {
    let content = match[1]!;
    try {
      content = inflateSync(Buffer.from(content, 'latin1')).toString('latin1');
    } catch {
      // Not compressed.
    }
    for (const op of content.matchAll(/\[(.*?)\]\s*TJ|(<[0-9a-fA-F]*>|\((?:\\.|[^\\)])*\))\s*Tj/g)) {
      const parts = (op[1] ?? op[2]!).matchAll(/<([0-9a-fA-F]*)>|\(((?:\\.|[^\\)])*)\)/g);
      lines.push([...parts].map((part) => (part[1] !== undefined ? Buffer.from(part[1], 'hex').toString('latin1') : part[2]!.replace(/\\(.)/g, '$1'))).join(''));
    }
  }
  return lines.join('\n');
}

describe('calculation records over HTTP', () => {
  let t: TestApp;
  let author: string;
  let admin: string;
  let reader: string;
  let reviewer: string;
  let page: Page;
  let revisionA: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const records: Record<string, CalculationRecord> = {};

  const save = (token: string, inputs: object, reference: object = {}, extra: object = {}) =>
    t.http.post('/api/records').set(as(token)).send({ pageId: page.id, revisionId: revisionA, blockId, inputs, reference, ...extra });

  beforeAll(async () => {
    t = await createTestApp();
    [author, admin, reader, reviewer] = await Promise.all([t.signIn('author'), t.signIn('admin'), t.signIn('reader'), t.signIn('reviewer')]);
    const collection = (await t.http.post('/api/collections').set(as(author)).send({ key: 'test-records', name: 'Record tests' }).expect(201)).body as Collection;
    page = (
      await t.http
        .post('/api/pages')
        .set(as(author))
        .send({ documentNumber: 'TST-REC-001', collectionId: collection.id, title: 'Port wall rule', document: doc(paragraph('Keep the wall.'), wallBlock(1.5)) })
        .expect(201)
    ).body as Page;
    page = await releasePage(t, page.id, { submitter: author, approver: reviewer });
    revisionA = page.published!.id;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('saves records as the server evaluates them, with the locked inputs taken from the page', async () => {
    const before = await t.rowCounts();
    const response = await save(reader, { ...sized(20.1), positionTolerance: 0.2 }, { partNumber: 'P-100', drawing: 'DWG-7', note: 'First article' }).expect(201);
    const record = response.body as CalculationRecord;
    expect(record).toMatchObject({
      page: { id: page.id, documentNumber: 'TST-REC-001', title: 'Port wall rule' },
      revision: { id: revisionA },
      blockId,
      method: 'wall-thickness',
      unit: 'mm',
      outputs: { minWall: 4.8 },
      verdict: { pass: true },
      acceptance: { output: 'minWall', operator: '>=', value: 1.5 },
      reference: { partNumber: 'P-100', drawing: 'DWG-7', note: 'First article' },
      createdBy: { email: t.demoPerson('reader').email },
    });
    expect(record.methodVersion).toBeGreaterThanOrEqual(1);
    expect(record.inputs).toMatchObject(lockedDefaults);
    expect(record.steps.length).toBeGreaterThan(2);
    records['pass4.8'] = record;
    const after = await t.rowCounts();
    expect(after['calculation_records']).toBe(before['calculation_records']! + 1);
    expect(after['audit_events']).toBe(before['audit_events']! + 1);

    records['pass1.6'] = (await save(reviewer, sized(26.5), { partNumber: 'P-200' }).expect(201)).body as CalculationRecord;
    records['fail1.35'] = (await save(reader, sized(27), { note: '=cmd|" /C calc"!A0' }).expect(201)).body as CalculationRecord;
    records['pass4.85'] = (await save(author, sized(20.1, 30)).expect(201)).body as CalculationRecord;
    records['pass4.9'] = (await save(reader, sized(20.1, 30.1)).expect(201)).body as CalculationRecord;
    expect(Object.fromEntries(Object.entries(records).map(([key, value]) => [key, [value.outputs['minWall'], value.verdict?.pass]]))).toEqual({
      'pass4.8': [4.8, true],
      'pass1.6': [1.6, true],
      'fail1.35': [1.35, false],
      'pass4.85': [4.85, true],
      'pass4.9': [4.9, true],
    });
  });

  it('refuses a changed locked input with 400 naming it, and writes nothing', async () => {
    const before = await t.rowCounts();
    const response = await save(reader, { ...sized(20.1), positionTolerance: 0.1, toleranceModifier: 'MMC' }).expect(400);
    const body = response.body as ErrorBody;
    expect(body.code).toBe('VALIDATION_FAILED');
    expect(body.fields).toEqual({ 'inputs.positionTolerance': expect.stringMatching(/Locked/), 'inputs.toleranceModifier': expect.stringMatching(/Locked/) });
    expect(body.message).toContain('positionTolerance');
    expect(await t.rowCounts()).toEqual(before);
  });

  it('refuses bad inputs, unknown blocks and drafts without a 500', async () => {
    const bad = (await save(reader, { ...sized(20.1), feature: { featureType: 'internal', lowerLimit: 21, upperLimit: 20 } }).expect(400)).body as ErrorBody;
    expect(Object.keys(bad.fields ?? {}).every((key) => key.startsWith('inputs'))).toBe(true);
    await t.http.post('/api/records').set(as(reader)).send({ pageId: page.id, revisionId: revisionA, blockId: '00000000-0000-4000-8000-000000000000', inputs: {} }).expect(404);
    await t.http.post(`/api/pages/${page.id}/draft`).set(as(author)).expect(201);
    const draft = ((await t.http.get(`/api/pages/${page.id}?view=draft`).set(as(author)).expect(200)).body as Page).revision.id;
    await t.http.post('/api/records').set(as(reader)).send({ pageId: page.id, revisionId: draft, blockId, inputs: sized(20.1) }).expect(404);
    const refused = (await t.http.post('/api/records').set(as(author)).send({ pageId: page.id, revisionId: draft, blockId, inputs: sized(20.1) }).expect(400)).body as ErrorBody;
    expect(refused.fields).toHaveProperty('revisionId');
    await t.http.delete(`/api/pages/${page.id}/draft`).set(as(author)).expect(204);
  });

  it('serves a permalink with who, when and which page revision', async () => {
    const record = records['pass4.8']!;
    const response = await t.http.get(`/api/records/${record.id}`).set(as(reviewer)).expect(200);
    expect(response.body).toEqual(record);
    // A record cites the release by its letter, as a drawing would.
    expect(record.revision).toMatchObject({ id: revisionA, revisionLetter: 'A', state: 'released' });
    await t.http.get('/api/records/00000000-0000-4000-8000-000000000000').set(as(reader)).expect(404);
  });

  it('lists my records by default, with filters; everyone\'s for admins only', async () => {
    const mine = (await t.http.get('/api/records').set(as(reader)).expect(200)).body as RecordList;
    expect(mine.items.map((item) => item.id).sort()).toEqual([records['pass4.8']!.id, records['fail1.35']!.id, records['pass4.9']!.id].sort());
    const failing = (await t.http.get('/api/records?verdict=fail').set(as(reader)).expect(200)).body as RecordList;
    expect(failing.items.map((item) => item.id)).toEqual([records['fail1.35']!.id]);
    const byPage = (await t.http.get(`/api/records?pageId=${page.id}&method=wall-thickness&verdict=pass`).set(as(reader)).expect(200)).body as RecordList;
    expect(byPage.total).toBe(2);
    const future = (await t.http.get(`/api/records?from=${encodeURIComponent(new Date(Date.now() + 60_000).toISOString())}`).set(as(reader)).expect(200)).body as RecordList;
    expect(future.total).toBe(0);
    const past = (await t.http.get(`/api/records?to=${encodeURIComponent(new Date(Date.now() + 60_000).toISOString())}&limit=1`).set(as(reader)).expect(200)).body as RecordList;
    expect(past).toMatchObject({ total: 3, items: [expect.any(Object)] });
    await t.http.get('/api/records?scope=all').set(as(reader)).expect(403);
    const all = (await t.http.get('/api/records?scope=all').set(as(admin)).expect(200)).body as RecordList;
    expect(all.total).toBe(5);
    const byNumber = (await t.http.get('/api/records?documentNumber=tst-rec').set(as(reader)).expect(200)).body as RecordList;
    expect(byNumber.total).toBe(3);
    expect(((await t.http.get('/api/records?documentNumber=TST-OTHER').set(as(reader)).expect(200)).body as RecordList).total).toBe(0);
    const byPart = (await t.http.get('/api/records?reference=p-1').set(as(reader)).expect(200)).body as RecordList;
    expect(byPart.items.map((item) => item.id)).toEqual([records['pass4.8']!.id]);
    const byNote = (await t.http.get('/api/records?reference=FIRST%20art').set(as(reader)).expect(200)).body as RecordList;
    expect(byNote.items.map((item) => item.id)).toEqual([records['pass4.8']!.id]);
    // A typed % is a character, not a wildcard.
    expect(((await t.http.get('/api/records?reference=%25').set(as(reader)).expect(200)).body as RecordList).total).toBe(0);
    const csv = await t.http.get('/api/records/export.csv?reference=p-100').set(as(reader)).expect(200);
    expect((csv.text as string).trimEnd().split('\r\n')).toHaveLength(2);
    const picked = [records['pass4.8']!.id, records['pass4.9']!.id];
    const selection = await t.http.get(`/api/records/export.csv?ids=${picked.join(',')}`).set(as(reader)).expect(200);
    const selectedLines = (selection.text as string).trimEnd().split('\r\n').slice(1);
    expect(selectedLines.map((line) => line.split(',')[0]).sort()).toEqual([...picked].sort());
    // Someone else's record id in the selection is not exported: the owner scope still applies.
    const others = await t.http.get(`/api/records/export.csv?ids=${records['pass1.6']!.id}`).set(as(reader)).expect(200);
    expect((others.text as string).trimEnd().split('\r\n')).toHaveLength(1);
    const badIds = (await t.http.get('/api/records?ids=nope').set(as(reader)).expect(400)).body as ErrorBody;
    expect(Object.keys(badIds.fields ?? {})[0]).toMatch(/^ids/);
    const badQuery = (await t.http.get('/api/records?verdict=maybe&from=yesterday').set(as(reader)).expect(400)).body as ErrorBody;
    expect(Object.keys(badQuery.fields ?? {}).sort()).toEqual(['from', 'verdict']);
  });

  it('exports CSV with formula-like cells kept as text', async () => {
    const response = await t.http.get('/api/records/export.csv?verdict=fail').set(as(reader)).expect(200);
    expect(response.headers['content-type']).toMatch(/^text\/csv/);
    const lines = (response.text as string).trimEnd().split('\r\n');
    expect(lines[0]).toMatch(/^record_id,created_at,created_by,document_number/);
    expect(lines).toHaveLength(2);
    expect(lines[1]).toContain(records['fail1.35']!.id);
    expect(lines[1]).toContain(`"'=cmd|"" /C calc""!A0"`);
    expect(lines[1]).not.toMatch(/,=cmd/);
  });

  it('renders one record as a PDF with header, tables, verdict and the derivation', async () => {
    const record = records['pass4.8']!;
    const response = await t.http
      .get(`/api/records/${record.id}.pdf`)
      .set(as(reader))
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(response.headers['content-type']).toBe('application/pdf');
    const pdf = response.body as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = pdfText(pdf);
    expect(text).toContain('Limitbook');
    expect(text).toContain(record.id);
    expect(text).toContain('TST-REC-001 Port wall rule');
    expect(text).toContain(`wall-thickness, version ${record.methodVersion}`);
    expect(text).toContain('P-100');
    expect(text).toContain('Rev. A (released)');
    expect(text).toContain('PASS');
    expect(text).toContain(record.steps[0]!.label);
    // Formulas are drawn as vector math; the plain-text fallback would bring in Courier.
    expect(pdf.toString('latin1')).not.toContain('/Courier');
    await t.http.get('/api/records/00000000-0000-4000-8000-000000000000.pdf').set(as(reader)).expect(404);
  });

  describe('impact check', () => {
    let revisionB: string;
    let report: ImpactReport;

    beforeAll(async () => {
      // Revision A replaced no release: there was nothing to check.
      const first = (await t.http.get(`/api/pages/${page.id}/revisions/${revisionA}/impact`).set(as(reviewer)).expect(200)).body as ReleaseImpact;
      expect(first).toEqual({ status: 'none', report: null });
      // Revision B tightens the rule from minWall ≥ 1.5 to ≥ 4.85.
      await t.http.post(`/api/pages/${page.id}/draft`).set(as(author)).expect(201);
      await t.http
        .put(`/api/pages/${page.id}/draft`)
        .set(as(author))
        .send({ baseVersion: 1, title: 'Port wall rule', document: doc(paragraph('Keep more wall.'), wallBlock(4.85)) })
        .expect(200);
      revisionB = (await releasePage(t, page.id, { submitter: author, approver: reviewer })).published!.id;
      // The release runs the impact check itself, after answering; wait for its mail.
      await waitFor(async () => (await t.readMail(t.demoPerson('reader').email)).some((mail) => isImpactMail(mail.subject)));
    });

    it('lists exactly the records that no longer pass, and mails each of their owners once', async () => {
      await t.http.post(`/api/pages/${page.id}/impact`).set(as(reader)).send({ fromRevisionId: revisionA, toRevisionId: revisionB }).expect(403);
      const response = await t.http.post(`/api/pages/${page.id}/impact`).set(as(author)).send({ fromRevisionId: revisionA, toRevisionId: revisionB }).expect(201);
      report = response.body as ImpactReport;
      expect(report.changedBlocks).toEqual([{ blockId, caption: 'Port to bore wall', changes: ['acceptance'] }]);
      expect(report.recordsChecked).toBe(5);
      expect(report.affected.map((entry) => entry.recordId).sort()).toEqual([records['pass4.8']!.id, records['pass1.6']!.id].sort());
      expect(report.affected.find((entry) => entry.recordId === records['pass4.8']!.id)).toEqual({
        recordId: records['pass4.8']!.id,
        blockId,
        owner: expect.objectContaining({ email: t.demoPerson('reader').email }),
        before: { pass: true, keyOutputs: { minWall: 4.8 } },
        after: { pass: false, keyOutputs: { minWall: 4.8 } },
      });

      // One mail per owner from the release's own check, and one more from this explicit re-run.
      const readerMail = (await t.readMail(t.demoPerson('reader').email)).filter((mail) => isImpactMail(mail.subject));
      expect(readerMail).toHaveLength(2);
      expect(readerMail[0]!.text).toContain(`/records/${records['pass4.8']!.id}`);
      expect(readerMail[0]!.text).not.toContain(records['fail1.35']!.id);
      expect((await t.readMail(t.demoPerson('reviewer').email)).filter((mail) => isImpactMail(mail.subject))).toHaveLength(2);
      expect((await t.readMail(t.demoPerson('author').email)).filter((mail) => isImpactMail(mail.subject))).toHaveLength(0);

      // The stored records keep what was computed under revision A.
      expect(((await t.http.get(`/api/records/${records['pass4.8']!.id}`).set(as(reader)).expect(200)).body as CalculationRecord).verdict?.pass).toBe(true);
    });

    it('stores the report, and exposes the same check for the release to call', async () => {
      const stored = (await t.http.get(`/api/impact-reports/${report.id}`).set(as(admin)).expect(200)).body as ImpactReport;
      expect(stored).toEqual(report);
      await t.http.get(`/api/impact-reports/${report.id}`).set(as(reader)).expect(403);

      const again = await t.app.get(RecordsService).checkImpact(page.id, revisionA, revisionB);
      expect(again.affected.map((entry) => entry.recordId).sort()).toEqual(report.affected.map((entry) => entry.recordId).sort());
      expect(again.createdBy).toBeNull();
      const unchanged = await t.app.get(RecordsService).checkImpact(page.id, revisionB, revisionB);
      expect(unchanged).toMatchObject({ changedBlocks: [], recordsChecked: 0, affected: [] });
    });

    it("shows a release's own check to authors, reviewers and admins, and each affected record's owner on the record", async () => {
      const released = (await t.http.get(`/api/pages/${page.id}/revisions/${revisionB}/impact`).set(as(reviewer)).expect(200)).body as ReleaseImpact;
      expect(released.status).toBe('ready');
      expect(released.report?.toRevisionId).toBe(revisionB);
      expect(released.report?.affected.map((entry) => entry.recordId).sort()).toEqual([records['pass4.8']!.id, records['pass1.6']!.id].sort());
      await t.http.get(`/api/pages/${page.id}/revisions/${revisionB}/impact`).set(as(author)).expect(200);
      await t.http.get(`/api/pages/${page.id}/revisions/${revisionB}/impact`).set(as(reader)).expect(403);
      await t.http.get(`/api/pages/${page.id}/revisions/00000000-0000-4000-8000-000000000000/impact`).set(as(reviewer)).expect(404);

      const listed = (await t.http.get(`/api/records/${records['pass4.8']!.id}/impact`).set(as(reader)).expect(200)).body as RecordImpactList;
      // Several checks of the same release (the approval's and explicit re-runs) count once.
      expect(listed.items).toEqual([
        {
          reportId: expect.any(String),
          toRevision: { id: revisionB, revisionLetter: 'B' },
          checkedAt: expect.any(String),
          before: { pass: true, keyOutputs: { minWall: 4.8 } },
          after: { pass: false, keyOutputs: { minWall: 4.8 } },
        },
      ]);
      expect(((await t.http.get(`/api/records/${records['fail1.35']!.id}/impact`).set(as(reader)).expect(200)).body as RecordImpactList).items).toEqual([]);
      await t.http.get('/api/records/00000000-0000-4000-8000-000000000000/impact').set(as(reader)).expect(404);

      // Until the approval's check has stored its report, the release says it is pending.
      await t.db.delete(impactReports).where(eq(impactReports.toRevisionId, revisionB));
      const pending = (await t.http.get(`/api/pages/${page.id}/revisions/${revisionB}/impact`).set(as(admin)).expect(200)).body as ReleaseImpact;
      expect(pending).toEqual({ status: 'pending', report: null });
    });

    it('refuses revisions of another page or the same revision twice', async () => {
      const missing = (await t.http
        .post(`/api/pages/${page.id}/impact`)
        .set(as(author))
        .send({ fromRevisionId: revisionA, toRevisionId: '00000000-0000-4000-8000-000000000000' })
        .expect(404)).body as ErrorBody;
      expect(missing.fields).toHaveProperty('toRevisionId');
      await t.http.post(`/api/pages/${page.id}/impact`).set(as(author)).send({ fromRevisionId: revisionA, toRevisionId: revisionA }).expect(400);
      await t.http.post('/api/pages/00000000-0000-4000-8000-000000000000/impact').set(as(author)).send({ fromRevisionId: revisionA, toRevisionId: revisionB }).expect(404);
    });
  });
});

async function waitFor(condition: () => Promise<boolean>, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await condition())) {
    if (Date.now() > deadline) throw new Error('Condition not met in time');
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

function isImpactMail(subject: string): boolean {
  return subject.startsWith('TST-REC-001') && subject.includes('calculation record');
}
