import { type Collection, type ErrorBody, type Page } from '@limitbook/contracts';
import { documentLimits } from '@limitbook/editor-schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { JSON_BODY_LIMIT } from './app.setup.js';
import { createTestApp, type TestApp } from './testing/test-app.js';

const sentence = 'The bore is checked at least material condition before the port is drilled. ';
const paragraph = { type: 'paragraph', content: [{ type: 'text', text: sentence.repeat(100) }] };

/** A valid page of about `bytes` of JSON, made of ordinary paragraphs (well under the node limit). */
function documentOfSize(bytes: number): object {
  const count = Math.ceil(bytes / JSON.stringify(paragraph).length);
  return { type: 'doc', content: Array.from({ length: count }, () => paragraph) };
}

const megabytes = (value: number) => Math.round(value * 1024 * 1024);

describe('JSON body limit and the page size limit', () => {
  let t: TestApp;
  let author: string;
  let page: Page;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp();
    author = await t.signIn('author');
    const collection = (await t.http.post('/api/collections').set(as(author)).send({ key: 'test-body-limit', name: 'Body limit' }).expect(201)).body as Collection;
    const created = await t.http
      .post('/api/pages')
      .set(as(author))
      .send({ documentNumber: 'TST-LIM-001', collectionId: collection.id, title: 'Large page', document: documentOfSize(1000) });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    page = created.body as Page;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('sits just above the page limit, from the same constant', () => {
    expect(JSON_BODY_LIMIT).toBeGreaterThan(documentLimits.maxJsonBytes);
    expect(JSON_BODY_LIMIT).toBeLessThanOrEqual(documentLimits.maxJsonBytes * 1.25);
  });

  it('saves a valid 1.5 MB page', async () => {
    const document = documentOfSize(megabytes(1.5));
    expect(JSON.stringify(document).length).toBeGreaterThan(megabytes(1.5));
    const response = await t.http.put(`/api/pages/${page.id}/draft`).set(as(author)).send({ baseVersion: page.revision.version, title: 'Large page', document });
    expect(response.status, JSON.stringify(response.body).slice(0, 500)).toBe(200);
    page = response.body as Page;
  });

  it('refuses a page just over the page limit with the schema 400, not a 413', async () => {
    const document = documentOfSize(documentLimits.maxJsonBytes + 64 * 1024);
    const before = await t.rowCounts();
    const response = await t.http.put(`/api/pages/${page.id}/draft`).set(as(author)).send({ baseVersion: page.revision.version, title: 'Too large', document }).expect(400);
    const body = response.body as ErrorBody;
    expect(body.code).toBe('VALIDATION_FAILED');
    expect(body.fields?.document).toBe('Document is larger than 2 MB');
    expect(await t.rowCounts()).toEqual(before);
  });

  it('cuts off a 2.5 MB body with 413 before reading it', async () => {
    const document = documentOfSize(megabytes(2.5));
    const before = await t.rowCounts();
    const response = await t.http.put(`/api/pages/${page.id}/draft`).set(as(author)).send({ baseVersion: page.revision.version, title: 'Far too large', document }).expect(413);
    expect(response.body).toMatchObject({ statusCode: 413, code: 'PAYLOAD_TOO_LARGE' });
    expect(await t.rowCounts()).toEqual(before);
  });
});
