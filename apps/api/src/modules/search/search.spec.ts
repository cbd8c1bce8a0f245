import { type Collection, type ErrorBody, type Page, type SearchHit, type SearchResponse } from '@limitbook/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { releasePage } from '../library/testing/release-page.js';

const text = (value: string) => ({ type: 'text', text: value });
const paragraph = (value: string) => ({ type: 'paragraph', content: [text(value)] });
const calculator = (blockId: string, caption: string) => ({
  type: 'calculatorBlock',
  attrs: { blockId, method: 'wall-thickness', unit: 'mm', defaults: {}, locked: [], acceptance: null, caption },
});

const highlighted = (value: string, ranges: { start: number; end: number }[]) => ranges.map((range) => value.slice(range.start, range.end));

describe('GET /api/search', () => {
  let t: TestApp;
  let author: string;
  let reader: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  async function publish(documentNumber: string, collection: Collection, title: string, content: object[], tags: string[] = []): Promise<Page> {
    const created = await t.http
      .post('/api/pages')
      .set(as(author))
      .send({ documentNumber, collectionId: collection.id, title, tags, document: { type: 'doc', content } });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const page = created.body as Page;
    await releasePage(t, page.id, { submitter: author, approver: await t.signIn('reviewer') });
    return page;
  }

  async function search(query: Record<string, string>, token = reader): Promise<SearchResponse> {
    const response = await t.http.get('/api/search').query(query).set(as(token));
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    return response.body as SearchResponse;
  }

  beforeAll(async () => {
    t = await createTestApp();
    [author, reader] = await Promise.all([t.signIn('author'), t.signIn('reader')]);
    const seals = (await t.http.post('/api/collections').set(as(author)).send({ key: 'seal-rules', name: 'Seal rules' }).expect(201)).body as Collection;
    const gauges = (await t.http.post('/api/collections').set(as(author)).send({ key: 'gauge-rules', name: 'Gauge rules' }).expect(201)).body as Collection;
    await publish('QX-SEA-310', seals, 'Gland depth for quadrilobe seals', [
      paragraph('Purpose of this rule.'),
      paragraph('The groove must leave enough squeeze on the elastomer at every tolerance extreme.'),
    ], ['seal', 'groove']);
    await publish('QX-SEA-311', seals, 'Surface finish of sealing faces', [
      paragraph('Finish of the faces against which a quadrilobe ring seals: Ra 0.8 or better, no lay across the seal.'),
      paragraph('A quadrilobe seal also needs a lead-in chamfer. Quadrilobe rings twist less than round ones.'),
    ], ['seal', 'finish']);
    await publish('QX-GAU-500', gauges, 'Plug gauges for ports', [
      paragraph('Go and no-go plugs for every port bore.'),
      calculator('7d9f0a11-5c3e-4b2a-9e8f-1a2b3c4d5e6f', 'Zircotherm sleeve wall at worst-case offset'),
    ], ['gauge']);
    await publish('QY-SEA-320', seals, 'Gland wall under pressure', [
      { type: 'paragraph', content: [text('The pressure at which the wall fails,'), { type: 'inlineMath', attrs: { latex: 'p_{burst} = \\frac{2\\,t\\,S}{d}' } }, text(', must exceed the proof pressure.')] },
      { type: 'blockMath', attrs: { latex: 't_{req} = \\frac{p\\,d}{2\\,\\kappa\\,S}' } },
    ]);
    const draftOnly = (await t.http
      .post('/api/pages')
      .set(as(author))
      .send({ documentNumber: 'QX-GAU-501', collectionId: gauges.id, title: 'Unpublished plumbago gauges', document: { type: 'doc', content: [paragraph('Plumbago everywhere.')] } })
      .expect(201)).body as Page;
    expect(draftOnly.revision.state).toBe('draft');
  });
  afterAll(async () => {
    await t?.close();
  });

  it('finds a page by a word of its body, with a plain-text snippet and highlight ranges', async () => {
    const result = await search({ q: 'elastomer' });
    expect(result.total).toBe(1);
    const [hit] = result.items as [SearchHit];
    expect(hit).toMatchObject({ documentNumber: 'QX-SEA-310', title: 'Gland depth for quadrilobe seals', collection: { key: 'seal-rules' }, tags: ['seal', 'groove'] });
    expect(hit.snippet).toContain('squeeze on the elastomer');
    expect(hit.snippet).not.toMatch(/[<>\uE000\uE001]/);
    expect(highlighted(hit.snippet, hit.highlights)).toEqual(['elastomer']);
  });

  it('finds words of a calculator block caption, and stems them', async () => {
    const result = await search({ q: 'zircotherm sleeves' });
    expect(result.items.map((item) => item.documentNumber)).toEqual(['QX-GAU-500']);
    expect(highlighted(result.items[0]!.snippet, result.items[0]!.highlights)).toEqual(['Zircotherm sleeve']);
  });

  it('finds a symbol that only appears in a formula, and the snippet keeps the formula in its place', async () => {
    const inline = await search({ q: 'burst' });
    expect(inline.items.map((item) => item.documentNumber)).toEqual(['QY-SEA-320']);
    const [hit] = inline.items as [SearchHit];
    expect(hit.snippet).toContain('pressure at which the wall fails, p_{burst} = \\frac{2\\,t\\,S}{d} , must exceed the proof pressure.');
    expect(highlighted(hit.snippet, hit.highlights)).toEqual(['burst']);
    expect((await search({ q: 'kappa' })).items.map((item) => item.documentNumber)).toEqual(['QY-SEA-320']);
  });

  it('finds a page by its document number, whole or by its beginning, before text hits', async () => {
    const exact = await search({ q: 'QX-GAU-500' });
    expect(exact.items[0]).toMatchObject({ documentNumber: 'QX-GAU-500', numberMatch: true });
    const prefix = await search({ q: 'qx-sea' });
    expect(prefix.items.map((item) => item.documentNumber)).toEqual(['QX-SEA-310', 'QX-SEA-311']);
    expect(prefix.items.every((item) => item.numberMatch)).toBe(true);
  });

  it('ranks a title hit above body hits, even frequent ones', async () => {
    const result = await search({ q: 'quadrilobe' });
    expect(result.items.map((item) => item.documentNumber)).toEqual(['QX-SEA-310', 'QX-SEA-311']);
    expect(highlighted(result.items[0]!.title, result.items[0]!.titleHighlights)).toEqual(['quadrilobe']);
    expect(result.items[1]!.highlights.length).toBeGreaterThan(0);
  });

  it('understands phrases and exclusions', async () => {
    expect((await search({ q: '"lead-in chamfer"' })).items.map((item) => item.documentNumber)).toEqual(['QX-SEA-311']);
    expect((await search({ q: 'quadrilobe -finish' })).items.map((item) => item.documentNumber)).toEqual(['QX-SEA-310']);
  });

  it('filters by collection and by tag', async () => {
    expect((await search({ q: 'QX', collection: 'gauge-rules' })).items.map((item) => item.documentNumber)).toEqual(['QX-GAU-500']);
    expect((await search({ q: 'seal', tag: 'finish' })).items.map((item) => item.documentNumber)).toEqual(['QX-SEA-311']);
    expect((await search({ q: 'seal', collection: 'gauge-rules' })).total).toBe(0);
  });

  it('never finds what is only in a draft, for readers and authors alike', async () => {
    expect((await search({ q: 'plumbago' })).total).toBe(0);
    expect((await search({ q: 'plumbago' }, author)).total).toBe(0);
    expect((await search({ q: 'QX-GAU-501' })).total).toBe(0);
  });

  it('searches the demo library too, and refuses an empty query with 400', async () => {
    const demo = await search({ q: 'BW-STD-112' });
    expect(demo.items[0]).toMatchObject({ documentNumber: 'BW-STD-112', numberMatch: true });
    const wall = await search({ q: 'minimum wall' });
    expect(wall.items.map((item) => item.documentNumber)).toContain('BW-STD-112');
    const refused = await t.http.get('/api/search').query({ q: '  ' }).set(as(reader)).expect(400);
    expect((refused.body as ErrorBody).fields).toEqual({ q: 'Type something to search for' });
    expect((await search({ q: 'the and of' })).total).toBe(0);
    await t.http.get('/api/search').query({ q: 'wall' }).expect(401);
  });
});
