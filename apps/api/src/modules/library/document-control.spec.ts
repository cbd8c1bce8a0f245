import { type Collection, type ErrorBody, type Page, type PageList, type PageRevision, type RevisionCompare, type RevisionHistory, type WatchedPageList } from '@limitbook/contracts';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pageRevisions } from '../../database/schema/index.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { demoUserId, releasePage } from './testing/release-page.js';

const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const blockId = '7d3f0c7e-2a51-4c8e-9f6b-0e4a1b2c3d4e';
const wallBlock = (minWall: number, locked: string[] = ['bore.diameter']) => ({
  type: 'calculatorBlock',
  attrs: {
    blockId,
    method: 'wall-between-features',
    methodVersion: 2,
    unit: 'mm',
    defaults: { bore: { diameter: 20, tolerance: 0.05 }, port: { diameter: 6 } },
    locked,
    acceptance: { output: 'minWall', operator: '>=', value: minWall, unit: 'mm' },
    caption: 'Port to bore wall',
  },
});
const doc = (...content: object[]) => ({ type: 'doc', content });

describe('document control over HTTP', () => {
  let t: TestApp;
  let author: string;
  let admin: string;
  let reviewer: string;
  let reader: string;
  let reviewerId: string;
  let readerId: string;
  let authorId: string;
  let collection: Collection;
  let page: Page;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const url = (suffix = '') => `/api/pages/${page.id}${suffix}`;

  beforeAll(async () => {
    t = await createTestApp();
    [author, admin, reviewer, reader] = await Promise.all([t.signIn('author'), t.signIn('admin'), t.signIn('reviewer'), t.signIn('reader')]);
    [reviewerId, readerId, authorId] = await Promise.all([demoUserId(t, 'reviewer'), demoUserId(t, 'reader'), demoUserId(t, 'author')]);
    collection = (await t.http.post('/api/collections').set(as(author)).send({ key: 'dc-rules', name: 'Document control tests' }).expect(201)).body as Collection;
    page = (
      await t.http
        .post('/api/pages')
        .set(as(author))
        .send({ documentNumber: 'DC-WAL-001', collectionId: collection.id, title: 'Port walls', document: doc(paragraph('Keep walls thick.'), wallBlock(1.5)) })
        .expect(201)
    ).body as Page;
  }, 120_000);
  afterAll(async () => {
    await t?.close();
  });

  describe('review of the first revision', () => {
    it('hides the draft from readers and reviewers', async () => {
      await t.http.get(url('?view=draft')).set(as(reader)).expect(403);
      await t.http.get(url('?view=draft')).set(as(reviewer)).expect(403);
      await t.http.get(url()).set(as(reader)).expect(404);
      await t.http.get(url('/revisions')).set(as(reader)).expect(404);
    });

    it('refuses submission by readers and reviewers, and to people who cannot review', async () => {
      await t.http.post(url('/draft/submit')).set(as(reader)).send({ reviewerIds: [reviewerId] }).expect(403);
      await t.http.post(url('/draft/submit')).set(as(reviewer)).send({ reviewerIds: [reviewerId] }).expect(403);
      const notReviewer = await t.http.post(url('/draft/submit')).set(as(author)).send({ reviewerIds: [readerId] }).expect(400);
      expect((notReviewer.body as ErrorBody).fields).toEqual({ reviewerIds: 'Reviewers must have the reviewer or admin role' });
      const empty = await t.http.post(url('/draft/submit')).set(as(author)).send({ reviewerIds: [] }).expect(400);
      expect((empty.body as ErrorBody).fields).toHaveProperty('reviewerIds');
    });

    it('submits to the chosen reviewer, who gets a mail; nothing can be edited while in review', async () => {
      const submitted = (await t.http.post(url('/draft/submit')).set(as(author)).send({ reviewerIds: [reviewerId], note: 'First issue.' }).expect(200)).body as Page;
      expect(submitted.revision).toMatchObject({ state: 'in_review', revisionLetter: null, review: { note: 'First issue.', reviewers: [{ id: reviewerId }] } });
      const mail = await t.readMail(t.demoPerson('reviewer').email);
      expect(mail.some((m) => m.subject.includes('DC-WAL-001'))).toBe(true);

      const saved = await t.http.put(url('/draft')).set(as(author)).send({ baseVersion: 1, title: 'Sneaky', document: doc() }).expect(409);
      expect((saved.body as ErrorBody).message).toMatch(/in review/);
      await t.http.delete(url('/draft')).set(as(author)).expect(409);
      await t.http.post(url('/draft/submit')).set(as(author)).send({ reviewerIds: [reviewerId] }).expect(409);

      // The reviewer sees what they review; a reader still does not.
      const forReviewer = (await t.http.get(url('?view=draft')).set(as(reviewer)).expect(200)).body as Page;
      expect(forReviewer.revision.state).toBe('in_review');
      await t.http.get(url('?view=draft')).set(as(reader)).expect(403);
    });

    it('sends back only with a comment, which the author gets by mail', async () => {
      const bare = await t.http.post(url('/draft/send-back')).set(as(reviewer)).send({}).expect(400);
      expect((bare.body as ErrorBody).fields).toHaveProperty('comment');
      await t.http.post(url('/draft/send-back')).set(as(reviewer)).send({ comment: '   ' }).expect(400);
      await t.http.post(url('/draft/send-back')).set(as(author)).send({ comment: 'Mine' }).expect(403);
      const backResponse = await t.http.post(url('/draft/send-back')).set(as(reviewer)).send({ comment: 'Cite the clause.' });
      expect(backResponse.status, JSON.stringify(backResponse.body)).toBe(200);
      const back = backResponse.body as Page;
      expect(back.revision).toMatchObject({ state: 'draft', review: { comment: 'Cite the clause.' } });
      const mail = await t.readMail(t.demoPerson('author').email);
      expect(mail.some((m) => m.subject.startsWith('Sent back: DC-WAL-001'))).toBe(true);
      // Sent back, it is a draft again: no approval.
      await t.http.post(url('/draft/approve')).set(as(reviewer)).send({ baseVersion: 1 }).expect(409);
    });

    it('lets the author withdraw a revision from review', async () => {
      await t.http.post(url('/draft/submit')).set(as(author)).send({ reviewerIds: [reviewerId] }).expect(200);
      await t.http.post(url('/draft/withdraw')).set(as(reader)).expect(403);
      const withdrawn = (await t.http.post(url('/draft/withdraw')).set(as(author)).expect(200)).body as Page;
      expect(withdrawn.revision.state).toBe('draft');
      await t.http.post(url('/draft/withdraw')).set(as(author)).expect(409);
    });

    it('refuses approval by the author role and by an admin who worked on the revision', async () => {
      const draft = (await t.http.get(url('?view=draft')).set(as(author)).expect(200)).body as Page;
      await t.http
        .put(url('/draft'))
        .set(as(admin))
        .send({ baseVersion: draft.revision.version, title: 'Port walls', document: doc(paragraph('Keep walls thick enough.'), wallBlock(1.5)) })
        .expect(200);
      await t.http.post(url('/draft/submit')).set(as(author)).send({ reviewerIds: [reviewerId] }).expect(200);
      await t.http.post(url('/draft/approve')).set(as(author)).send({ baseVersion: 2 }).expect(403);
      const own = await t.http.post(url('/draft/approve')).set(as(admin)).send({ baseVersion: 2 }).expect(403);
      expect((own.body as ErrorBody).message).toMatch(/another reviewer or admin has to approve/);
    });

    it('releases revision A on approval; readers see its letter, date and approver', async () => {
      const released = (await t.http.post(url('/draft/approve')).set(as(reviewer)).send({ baseVersion: 2, comment: 'Fine.' }).expect(200)).body as Page;
      expect(released.revision).toMatchObject({ state: 'released', revisionLetter: 'A', publishedBy: { id: reviewerId }, review: { comment: 'Fine.' } });
      expect(released.draft).toBeNull();
      const seen = (await t.http.get(url()).set(as(reader)).expect(200)).body as Page;
      expect(seen.revision).toMatchObject({ state: 'released', revisionLetter: 'A', publishedBy: { email: t.demoPerson('reviewer').email } });
      expect(seen.revision.publishedAt).toEqual(expect.any(String));
    });
  });

  describe('the next revision', () => {
    it('is edited while A stays live, released as B, and supersedes A; watchers but not the approver get mail', async () => {
      await t.http.post(url('/watch')).set(as(reader)).expect(200);
      await t.http.post(url('/watch')).set(as(reviewer)).expect(200);
      const watching = (await t.http.get('/api/watching').set(as(reader)).expect(200)).body as WatchedPageList;
      expect(watching.items).toEqual([expect.objectContaining({ documentNumber: 'DC-WAL-001', revisionLetter: 'A' })]);

      const draft = (await t.http.post(url('/draft')).set(as(author)).expect(201)).body as Page;
      await t.http
        .put(url('/draft'))
        .set(as(author))
        .send({ baseVersion: draft.revision.version, title: 'Port walls, tightened', document: doc(paragraph('Keep walls thicker.'), wallBlock(2, ['bore.diameter', 'port.diameter'])) })
        .expect(200);
      const live = (await t.http.get(url()).set(as(reader)).expect(200)).body as Page;
      expect(live.revision).toMatchObject({ revisionLetter: 'A', title: 'Port walls' });

      const b = await releasePage(t, page.id, { submitter: author, approver: reviewer });
      expect(b.revision).toMatchObject({ state: 'released', revisionLetter: 'B', title: 'Port walls, tightened' });
      const readerMail = await t.readMail(t.demoPerson('reader').email);
      const notice = readerMail.find((m) => m.subject === 'Released: DC-WAL-001 revision B');
      expect(notice).toBeDefined();
      expect(notice!.text).toContain('/standards/DC-WAL-001');
      const reviewerMail = await t.readMail(t.demoPerson('reviewer').email);
      expect(reviewerMail.some((m) => m.subject.startsWith('Released:'))).toBe(false);

      const history = (await t.http.get(url('/revisions')).set(as(reader)).expect(200)).body as RevisionHistory;
      expect(history.items.map((item) => [item.revisionLetter, item.state])).toEqual([
        ['B', 'released'],
        ['A', 'superseded'],
      ]);
      expect(history.items[1]!.supersededAt).toEqual(expect.any(String));
      expect(history.items[0]!.approvedBy).toMatchObject({ id: reviewerId });
      await t.http.delete(url('/watch')).set(as(reader)).expect(200);
      expect(((await t.http.get('/api/watching').set(as(reader)).expect(200)).body as WatchedPageList).items).toEqual([]);
    });

    it('compares A with B: title, text lines and the calculator settings that changed', async () => {
      const history = (await t.http.get(url('/revisions')).set(as(reader)).expect(200)).body as RevisionHistory;
      const [b, a] = history.items;
      const compare = (await t.http.get(url(`/compare?from=${a!.id}&to=${b!.id}`)).set(as(reader)).expect(200)).body as RevisionCompare;
      expect(compare.title).toEqual({ from: 'Port walls', to: 'Port walls, tightened', changed: true });
      expect(compare.text).toEqual(
        expect.arrayContaining([
          { kind: 'removed', text: 'Keep walls thick enough.' },
          { kind: 'added', text: 'Keep walls thicker.' },
        ]),
      );
      expect(compare.blocks).toEqual([
        {
          blockId,
          change: 'changed',
          method: 'wall-between-features v2',
          caption: 'Port to bore wall',
          rows: [
            { setting: 'acceptance', path: null, from: 'minWall >= 1.5 mm', to: 'minWall >= 2 mm' },
            { setting: 'locked', path: 'port.diameter', from: 'open', to: 'locked' },
          ],
        },
      ]);
      const single = (await t.http.get(url(`/revisions/${a!.id}`)).set(as(reader)).expect(200)).body as PageRevision;
      expect(single).toMatchObject({ revisionLetter: 'A', state: 'superseded' });
      await t.http.get(url(`/compare?from=${a!.id}`)).set(as(reader)).expect(400);
    });

    it('never changes released or superseded content, through any route', async () => {
      const before = await t.db.select().from(pageRevisions).where(eq(pageRevisions.pageId, page.id));
      const attempts: [string, () => Promise<{ status: number }>][] = [
        ['save', () => t.http.put(url('/draft')).set(as(admin)).send({ baseVersion: 1, title: 'Changed', document: doc(paragraph('Changed')) })],
        ['save stale', () => t.http.put(url('/draft')).set(as(author)).send({ baseVersion: 3, title: 'Changed', document: doc() })],
        ['delete', () => t.http.delete(url('/draft')).set(as(admin))],
        ['submit', () => t.http.post(url('/draft/submit')).set(as(author)).send({ reviewerIds: [reviewerId] })],
        ['withdraw', () => t.http.post(url('/draft/withdraw')).set(as(admin))],
        ['approve', () => t.http.post(url('/draft/approve')).set(as(reviewer)).send({ baseVersion: 1 })],
        ['send back', () => t.http.post(url('/draft/send-back')).set(as(reviewer)).send({ comment: 'Undo' })],
        ['reader save', () => t.http.put(url('/draft')).set(as(reader)).send({ baseVersion: 1, title: 'Changed', document: doc() })],
        ['reviewer restore', () => t.http.post(url(`/revisions/${before[0]!.id}/restore`)).set(as(reviewer))],
      ];
      for (const [name, attempt] of attempts) {
        const response = await attempt();
        expect([403, 409], name).toContain(response.status);
      }
      // A metadata change and a new draft leave the released rows alone.
      await t.http.patch(url()).set(as(author)).send({ tags: ['walls'] }).expect(200);
      const draft = (await t.http.post(url('/draft')).set(as(author)).expect(201)).body as Page;
      await t.http.put(url('/draft')).set(as(author)).send({ baseVersion: draft.revision.version, title: 'Changed', document: doc(paragraph('Changed')) }).expect(200);
      await t.http.delete(url('/draft')).set(as(author)).expect(204);
      const after = await t.db.select().from(pageRevisions).where(eq(pageRevisions.pageId, page.id));
      expect(after).toEqual(before);
    });
  });

  describe('restore and obsolete', () => {
    it('restores A into a new draft (admins only, never over an open draft)', async () => {
      const history = (await t.http.get(url('/revisions')).set(as(admin)).expect(200)).body as RevisionHistory;
      const a = history.items.find((item) => item.revisionLetter === 'A')!;
      await t.http.post(url(`/revisions/${a.id}/restore`)).set(as(author)).expect(403);
      const restored = (await t.http.post(url(`/revisions/${a.id}/restore`)).set(as(admin)).expect(200)).body as Page;
      expect(restored.revision).toMatchObject({ state: 'draft', title: 'Port walls', restoredFromId: a.id });
      const again = await t.http.post(url(`/revisions/${a.id}/restore`)).set(as(admin)).expect(409);
      expect((again.body as ErrorBody).message).toMatch(/already has a draft/);
      await t.http.post(url(`/revisions/${restored.revision.id}/restore`)).set(as(admin)).expect(409);
      const live = (await t.http.get(url()).set(as(reader)).expect(200)).body as Page;
      expect(live.revision.revisionLetter).toBe('B');
      await t.http.delete(url('/draft')).set(as(author)).expect(204);
    });

    it('hides an obsolete page from lists unless asked, keeps it readable with the reason, and reinstates it', async () => {
      await t.http.post(url('/obsolete')).set(as(author)).send({ reason: 'x' }).expect(403);
      await t.http.post(url('/obsolete')).set(as(admin)).send({}).expect(400);
      const obsolete = (await t.http.post(url('/obsolete')).set(as(admin)).send({ reason: 'Replaced by DC-WAL-002.' }).expect(200)).body as Page;
      expect(obsolete.obsolete).toMatchObject({ reason: 'Replaced by DC-WAL-002.', by: { email: t.demoPerson('admin').email }, at: expect.any(String) });
      await t.http.post(url('/obsolete')).set(as(admin)).send({ reason: 'Again' }).expect(409);

      const list = (await t.http.get('/api/pages?collection=dc-rules').set(as(reader)).expect(200)).body as PageList;
      expect(list.items).toEqual([]);
      const found = await t.http.get('/api/search?q=DC-WAL-001').set(as(reader)).expect(200);
      expect(found.body.items).toEqual([]);
      const all = (await t.http.get('/api/pages?collection=dc-rules&includeObsolete=true').set(as(reader)).expect(200)).body as PageList;
      expect(all.items).toEqual([expect.objectContaining({ documentNumber: 'DC-WAL-001', obsolete: true, revisionLetter: 'B' })]);
      const read = (await t.http.get(url()).set(as(reader)).expect(200)).body as Page;
      expect(read.obsolete?.reason).toBe('Replaced by DC-WAL-002.');

      const back = (await t.http.post(url('/reinstate')).set(as(admin)).expect(200)).body as Page;
      expect(back.obsolete).toBeNull();
      await t.http.post(url('/reinstate')).set(as(admin)).expect(409);
      const listed = (await t.http.get('/api/pages?collection=dc-rules').set(as(reader)).expect(200)).body as PageList;
      expect(listed.items).toHaveLength(1);
      expect((await t.http.get('/api/search?q=DC-WAL-001').set(as(reader)).expect(200)).body.items).toHaveLength(1);
    });

    it('audits every state change, the restore and obsolescence', async () => {
      const audit = await t.http.get('/api/audit?limit=500').set(as(admin)).expect(200);
      const actions = (audit.body as { items: { action: string; subjectId: string | null }[] }).items.filter((item) => item.subjectId === page.id).map((item) => item.action);
      expect(actions).toEqual(
        expect.arrayContaining(['page.submitted', 'page.sent_back', 'page.review_withdrawn', 'page.released', 'page.restored', 'page.obsoleted', 'page.reinstated']),
      );
      expect(authorId).toEqual(expect.any(String));
    });
  });
});
