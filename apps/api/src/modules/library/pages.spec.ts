import { type Collection, type DraftConflictBody, type ErrorBody, type Page, type PageList } from '@limitbook/contracts';
import { everyNodeDocument } from '@limitbook/editor-schema/testing';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { JSON_BODY_LIMIT } from '../../app.setup.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { releasePage } from './testing/release-page.js';

const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const doc = (...content: object[]) => ({ type: 'doc', content });

describe('pages over HTTP', () => {
  let t: TestApp;
  let author: string;
  let admin: string;
  let reader: string;
  let reviewer: string;
  let collection: Collection;
  let other: Collection;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  async function createPage(documentNumber: string, extra: Record<string, unknown> = {}): Promise<Page> {
    const response = await t.http
      .post('/api/pages')
      .set(as(author))
      .send({ documentNumber, collectionId: collection.id, title: `Page ${documentNumber}`, document: doc(paragraph('First words.')), ...extra });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    return response.body as Page;
  }

  beforeAll(async () => {
    t = await createTestApp();
    [author, admin, reader, reviewer] = await Promise.all([t.signIn('author'), t.signIn('admin'), t.signIn('reader'), t.signIn('reviewer')]);
    collection = (await t.http.post('/api/collections').set(as(author)).send({ key: 'test-rules', name: 'Test rules' }).expect(201)).body as Collection;
    other = (await t.http.post('/api/collections').set(as(admin)).send({ key: 'test-other', name: 'Other tests', description: 'More.' }).expect(201)).body as Collection;
  });
  afterAll(async () => {
    await t?.close();
  });

  describe('collections', () => {
    it('are listed for every role and created by authors and admins only', async () => {
      const list = await t.http.get('/api/collections').set(as(reader)).expect(200);
      expect((list.body as { items: Collection[] }).items.map((item) => item.key)).toEqual(expect.arrayContaining(['test-rules', 'test-other', 'design-rules']));
      await t.http.post('/api/collections').set(as(reader)).send({ key: 'nope', name: 'Nope' }).expect(403);
      const taken = await t.http.post('/api/collections').set(as(author)).send({ key: 'test-rules', name: 'Again' }).expect(409);
      expect((taken.body as ErrorBody).fields).toEqual({ key: 'Already in use' });
      const bad = await t.http.post('/api/collections').set(as(author)).send({ key: 'Bad Key', name: '' }).expect(400);
      expect(Object.keys((bad.body as ErrorBody).fields ?? {}).sort()).toEqual(['key', 'name']);
    });

    it('are renamed by authors and deleted by admins only while empty', async () => {
      const renamed = await t.http.patch(`/api/collections/${other.id}`).set(as(author)).send({ name: 'Other test rules' }).expect(200);
      expect(renamed.body).toMatchObject({ key: 'test-other', name: 'Other test rules', description: 'More.' });
      const spare = (await t.http.post('/api/collections').set(as(author)).send({ key: 'test-spare', name: 'Spare' }).expect(201)).body as Collection;
      await t.http.delete(`/api/collections/${spare.id}`).set(as(author)).expect(403);
      await t.http.delete(`/api/collections/${spare.id}`).set(as(admin)).expect(204);
      const designRules = ((await t.http.get('/api/collections').set(as(admin))).body as { items: Collection[] }).items.find((item) => item.key === 'design-rules')!;
      await t.http.delete(`/api/collections/${designRules.id}`).set(as(admin)).expect(409);
    });
  });

  describe('document validation on save', () => {
    let page: Page;
    beforeAll(async () => {
      page = await createPage('TST-VAL-001');
    });

    it('accepts a page using every node and mark the editor produces', async () => {
      const saved = await t.http.put(`/api/pages/${page.id}/draft`).set(as(author)).send({ baseVersion: 1, title: 'Every node', document: everyNodeDocument() }).expect(200);
      const body = saved.body as Page;
      expect(body.revision).toMatchObject({ state: 'draft', version: 2, title: 'Every node' });
      expect(JSON.stringify(body.revision.document)).toContain('Port P1 to main bore wall');
      // The page refers to an uploaded file: its signed address comes with the page.
      expect(Object.keys(body.fileUrls)).toEqual(['c3d4e5f6-a7b8-4c9d-8e0f-1a2b3c4d5e6f']);
    });

    const hostile: [string, unknown, string, RegExp][] = [
      ['a script node', doc({ type: 'script', content: [{ type: 'text', text: 'alert(1)' }] }), 'document.content.0.type', /Unknown node type script/],
      ['an event-handler attribute', doc({ type: 'image', attrs: { src: 'https://example.com/a.png', onerror: 'alert(1)' } }), 'document.content.0.attrs.onerror', /Unknown attribute onerror/],
      [
        'a javascript: link',
        doc({ type: 'paragraph', content: [{ type: 'text', text: 'x', marks: [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }] }] }),
        'document.content.0.content.0.marks.0.attrs.href',
        /Link must be/,
      ],
      ['raw HTML as an unknown node', doc({ type: 'htmlBlock', attrs: { html: '<img src=x onerror=alert(1)>' } }), 'document.content.0.type', /Unknown node type htmlBlock/],
      ['a javascript: image', doc({ type: 'image', attrs: { src: 'javascript:alert(1)' } }), 'document.content.0.attrs.src', /Image must be/],
      ['an unknown field on a node', doc({ type: 'paragraph', html: '<b>x</b>' }), 'document.content.0.html', /Unknown field html/],
      ['a doc inside a doc', { type: 'doc', content: [{ type: 'doc' }] }, 'document', /A doc cannot hold doc/],
      ['too many nodes', doc(...Array.from({ length: 20_001 }, () => ({ type: 'horizontalRule' }))), 'document', /more than 20000 nodes/],
    ];

    it.each(hostile)('refuses %s with 400, the path of the problem, and writes nothing', async (_label, document, path, message) => {
      const before = await t.rowCounts();
      const response = await t.http.put(`/api/pages/${page.id}/draft`).set(as(author)).send({ baseVersion: 2, title: 'Hostile', document }).expect(400);
      const body = response.body as ErrorBody;
      expect(body.code).toBe('VALIDATION_FAILED');
      expect(body.fields?.[path], JSON.stringify(body.fields)).toMatch(message);
      expect(await t.rowCounts()).toEqual(before);
      const draft = (await t.http.get(`/api/pages/${page.id}?view=draft`).set(as(author)).expect(200)).body as Page;
      expect(draft.revision).toMatchObject({ version: 2, title: 'Every node' });
    });

    it('refuses a body over the request size limit with 413 and a hostile body on create with 400', async () => {
      const huge = doc(paragraph('x'.repeat(JSON_BODY_LIMIT)));
      const tooLarge = await t.http.put(`/api/pages/${page.id}/draft`).set(as(author)).send({ baseVersion: 2, title: 'Huge', document: huge }).expect(413);
      expect((tooLarge.body as ErrorBody).code).toBe('PAYLOAD_TOO_LARGE');
      const before = await t.rowCounts();
      const refused = await t.http
        .post('/api/pages')
        .set(as(author))
        .send({ documentNumber: 'TST-VAL-002', collectionId: collection.id, title: 'Bad', document: doc({ type: 'script' }) })
        .expect(400);
      expect((refused.body as ErrorBody).fields).toHaveProperty(['document.content.0.type']);
      expect(await t.rowCounts()).toEqual(before);
    });
  });

  describe('optimistic locking', () => {
    it('lets exactly one of two saves from the same version through; the other gets 409 with the current version', async () => {
      const page = await createPage('TST-LCK-001');
      const save = (text: string) => t.http.put(`/api/pages/${page.id}/draft`).set(as(author)).send({ baseVersion: 1, title: text, document: doc(paragraph(text)) });
      const responses = await Promise.all([save('Edit from tab one'), save('Edit from tab two')]);
      expect(responses.map((response) => response.status).sort()).toEqual([200, 409]);
      const winner = responses.find((response) => response.status === 200)!.body as Page;
      const loser = responses.find((response) => response.status === 409)!.body as DraftConflictBody;
      expect(loser.code).toBe('CONFLICT');
      expect(loser.current).toMatchObject({ version: 2, updatedBy: { email: t.demoPerson('author').email } });
      expect(loser.fields).toEqual({ baseVersion: 'The draft is at version 2' });
      const stored = (await t.http.get(`/api/pages/${page.id}?view=draft`).set(as(author)).expect(200)).body as Page;
      expect(stored.revision).toMatchObject({ version: 2, title: winner.revision.title });
      const retried = await t.http.put(`/api/pages/${page.id}/draft`).set(as(author)).send({ baseVersion: 2, title: 'Merged', document: doc(paragraph('Merged')) }).expect(200);
      expect((retried.body as Page).revision.version).toBe(3);
    });
  });

  describe('drafts and release', () => {
    let page: Page;
    beforeAll(async () => {
      page = await createPage('TST-PUB-001', { tags: ['wall', 'LMC', 'wall'] });
    });

    it('keeps a never-released page away from readers and reviewers', async () => {
      expect(page.tags).toEqual(['wall', 'LMC']);
      for (const token of [reader, reviewer]) {
        await t.http.get(`/api/pages/${page.id}`).set(as(token)).expect(404);
        await t.http.get(`/api/pages/TST-PUB-001`).set(as(token)).expect(404);
        await t.http.get(`/api/pages/${page.id}?view=draft`).set(as(token)).expect(403);
        const list = (await t.http.get('/api/pages?collection=test-rules').set(as(token)).expect(200)).body as PageList;
        expect(list.items.map((item) => item.documentNumber)).not.toContain('TST-PUB-001');
      }
      await t.http.put(`/api/pages/${page.id}/draft`).set(as(reader)).send({ baseVersion: 1, title: 'x', document: doc() }).expect(403);
      await t.http.post(`/api/pages/${page.id}/draft/submit`).set(as(reader)).send({ reviewerIds: [page.id] }).expect(403);
      const mine = (await t.http.get('/api/pages?collection=test-rules').set(as(author)).expect(200)).body as PageList;
      expect(mine.items.find((item) => item.documentNumber === 'TST-PUB-001')).toMatchObject({ hasDraft: true, publishedAt: null });
    });

    it('releases the draft; readers then see the released revision and never the next draft', async () => {
      const published = await releasePage(t, page.id, { submitter: author, approver: reviewer });
      expect(published.revision).toMatchObject({ state: 'released', revisionLetter: 'A', publishedBy: { email: t.demoPerson('reviewer').email } });
      expect(published.draft).toBeNull();

      await t.http.post(`/api/pages/${page.id}/draft`).set(as(author)).expect(201);
      await t.http.post(`/api/pages/${page.id}/draft`).set(as(author)).expect(409);
      await t.http
        .put(`/api/pages/${page.id}/draft`)
        .set(as(author))
        .send({ baseVersion: 1, title: 'Secret next revision', document: doc(paragraph('Unreleased wording.')) })
        .expect(200);

      const seen = (await t.http.get('/api/pages/tst-pub-001').set(as(reader)).expect(200)).body as Page;
      expect(seen.revision).toMatchObject({ state: 'released', revisionLetter: 'A', title: 'Page TST-PUB-001' });
      expect(seen.draft).toBeNull();
      expect(JSON.stringify(seen)).not.toContain('Unreleased');
      const listed = (await t.http.get('/api/pages?collection=test-rules').set(as(reader)).expect(200)).body as PageList;
      expect(listed.items.find((item) => item.documentNumber === 'TST-PUB-001')).toMatchObject({ title: 'Page TST-PUB-001', hasDraft: false });

      const forAuthor = (await t.http.get(`/api/pages/${page.id}`).set(as(author)).expect(200)).body as Page;
      expect(forAuthor.revision.state).toBe('released');
      expect(forAuthor.draft).toMatchObject({ title: 'Secret next revision', version: 2 });
    });

    it('discards a draft, and a never-released page with its draft', async () => {
      await t.http.delete(`/api/pages/${page.id}/draft`).set(as(author)).expect(204);
      await t.http.get(`/api/pages/${page.id}?view=draft`).set(as(author)).expect(404);
      await t.http.get(`/api/pages/${page.id}`).set(as(reader)).expect(200);

      const scratch = await createPage('TST-PUB-002');
      await t.http.delete(`/api/pages/${scratch.id}/draft`).set(as(author)).expect(204);
      await t.http.get(`/api/pages/${scratch.id}`).set(as(author)).expect(404);
    });

    it('audits creation and release', async () => {
      const audit = await t.http.get('/api/audit?limit=500').set(as(admin)).expect(200);
      const actions = (audit.body as { items: { action: string; subjectId: string | null }[] }).items.filter((item) => item.subjectId === page.id).map((item) => item.action);
      expect(actions).toEqual(expect.arrayContaining(['page.created', 'page.submitted', 'page.released', 'page.draft_started', 'page.draft_deleted']));
    });
  });

  describe('listing and metadata', () => {
    it('filters by collection and tag, finds pages by number, refuses duplicates', async () => {
      const a = await createPage('TST-LST-001', { tags: ['tst bolt pattern'] });
      const b = await createPage('TST-LST-002', { tags: ['tst bolt pattern', 'tst-flange'], collectionId: other.id });
      await createPage('TST-LST-003', { tags: ['tst-flange'] });
      for (const page of [a, b]) await releasePage(t, page.id, { submitter: author, approver: reviewer });

      const byTag = (await t.http.get('/api/pages').query({ tag: 'tst bolt pattern' }).set(as(reader)).expect(200)).body as PageList;
      expect(byTag.items.map((item) => item.documentNumber)).toEqual(['TST-LST-001', 'TST-LST-002']);
      const byBoth = (await t.http.get('/api/pages').query({ tag: 'tst-flange', collection: 'test-other' }).set(as(author)).expect(200)).body as PageList;
      expect(byBoth.items.map((item) => item.documentNumber)).toEqual(['TST-LST-002']);
      const tags = (await t.http.get('/api/tags').set(as(reader)).expect(200)).body as { items: { tag: string; count: number }[] };
      expect(tags.items).toContainEqual({ tag: 'tst bolt pattern', count: 2 });
      expect(tags.items.find((item) => item.tag === 'tst-flange')).toEqual({ tag: 'tst-flange', count: 1 });

      const duplicate = await t.http.post('/api/pages').set(as(author)).send({ documentNumber: 'tst-lst-001', collectionId: collection.id, title: 'Again' }).expect(409);
      expect((duplicate.body as ErrorBody).fields).toEqual({ documentNumber: 'Already used by another page' });
      const badRef = await t.http.get('/api/pages/not a number').set(as(reader)).expect(400);
      expect((badRef.body as ErrorBody).fields).toHaveProperty('ref');
      const unknownCollection = await t.http
        .post('/api/pages')
        .set(as(author))
        .send({ documentNumber: 'TST-LST-009', collectionId: '0f8e2c53-6a1d-4f4b-9a3e-5b7c2d1e8f90', title: 'Nowhere' })
        .expect(400);
      expect((unknownCollection.body as ErrorBody).fields).toEqual({ collectionId: 'No collection with this id' });

      const moved = (await t.http.patch(`/api/pages/${a.id}`).set(as(author)).send({ collectionId: other.id, tags: ['moved'] }).expect(200)).body as Page;
      expect(moved).toMatchObject({ collection: { key: 'test-other' }, tags: ['moved'] });
    });
  });
});
