import { type AuditList, type User, type UserList } from '@limitbook/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

describe('users (admin)', () => {
  let t: TestApp;
  let admin: string;
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.signIn('admin');
  });
  afterAll(async () => {
    await t?.close();
  });

  const list = async () => (await t.http.get('/api/users').set(bearer(admin)).expect(200)).body as UserList;
  const byEmail = async (email: string) => (await list()).items.find((user) => user.email === email)!;
  const auditActions = async () => ((await t.http.get('/api/audit').set(bearer(admin)).expect(200)).body as AuditList).items;

  it('lists the demo people with their roles and paging', async () => {
    const all = await list();
    expect(all.total).toBeGreaterThanOrEqual(4);
    expect(all.items.map((user) => user.role).sort()).toEqual(expect.arrayContaining(['admin', 'author', 'reader', 'reviewer']));
    const page = (await t.http.get('/api/users?limit=1&offset=1').set(bearer(admin)).expect(200)).body as UserList;
    expect(page.items).toHaveLength(1);
    expect(page.total).toBe(all.total);
  });

  it('changes a role and records who did it', async () => {
    const author = await byEmail(t.demoPerson('author').email);
    const changed = await t.http.patch(`/api/users/${author.id}`).set(bearer(admin)).send({ role: 'reviewer' }).expect(200);
    expect((changed.body as User).role).toBe('reviewer');
    const [event] = await auditActions();
    expect(event).toMatchObject({ action: 'user.role_changed', actorEmail: t.demoPerson('admin').email, subjectId: author.id, detail: { from: 'author', to: 'reviewer' } });
    await t.http.patch(`/api/users/${author.id}`).set(bearer(admin)).send({ role: 'author' }).expect(200);
  });

  it('deactivates and reactivates, auditing both', async () => {
    const reader = await byEmail(t.demoPerson('reader').email);
    expect((await t.http.patch(`/api/users/${reader.id}`).set(bearer(admin)).send({ active: false }).expect(200)).body.status).toBe('deactivated');
    expect((await t.http.patch(`/api/users/${reader.id}`).set(bearer(admin)).send({ active: true }).expect(200)).body.status).toBe('active');
    const actions = (await auditActions()).slice(0, 2).map((event) => event.action);
    expect(actions).toEqual(['user.reactivated', 'user.deactivated']);
  });

  it('refuses to deactivate yourself or to leave no active admin', async () => {
    const me = await byEmail(t.demoPerson('admin').email);
    const self = await t.http.patch(`/api/users/${me.id}`).set(bearer(admin)).send({ active: false }).expect(409);
    expect(self.body).toMatchObject({ code: 'CONFLICT', message: expect.stringMatching(/your own account/) });
    const demote = await t.http.patch(`/api/users/${me.id}`).set(bearer(admin)).send({ role: 'author' }).expect(409);
    expect(demote.body.message).toMatch(/at least one active admin/);
    expect((await byEmail(me.email)).role).toBe('admin');

    // With a second admin, the first may step down.
    const reviewer = await byEmail(t.demoPerson('reviewer').email);
    await t.http.patch(`/api/users/${reviewer.id}`).set(bearer(admin)).send({ role: 'admin' }).expect(200);
    await t.http.patch(`/api/users/${me.id}`).set(bearer(admin)).send({ role: 'author' }).expect(200);
    const reviewerToken = await t.signIn('reviewer');
    await t.http.patch(`/api/users/${me.id}`).set(bearer(reviewerToken)).send({ role: 'admin' }).expect(200);
    await t.http.patch(`/api/users/${reviewer.id}`).set(bearer(admin)).send({ role: 'reviewer' }).expect(200);
  });

  it('invites, re-sends a pending invitation, and refuses an address already in use', async () => {
    const first = await t.http.post('/api/users/invitations').set(bearer(admin)).send({ email: 'quality@brackwater.example', name: 'Q. Engineer', role: 'reader' }).expect(201);
    const again = await t.http.post('/api/users/invitations').set(bearer(admin)).send({ email: 'quality@brackwater.example', name: 'Quinn Engineer', role: 'reviewer' }).expect(201);
    expect(again.body).toMatchObject({ id: first.body.id, name: 'Quinn Engineer', role: 'reviewer', status: 'invited' });
    expect(await t.readMail('quality@brackwater.example')).toHaveLength(2);
    const [event] = await auditActions();
    expect(event).toMatchObject({ action: 'user.invited', detail: { email: 'quality@brackwater.example', resent: true } });

    const taken = await t.http.post('/api/users/invitations').set(bearer(admin)).send({ email: t.demoPerson('author').email, name: 'Dup', role: 'reader' }).expect(409);
    expect(taken.body.fields).toHaveProperty('email');
  });

  describe('changes apply on the very next request of a token already in use', () => {
    it('refuses a deactivated user at once', async () => {
      const reader = await byEmail(t.demoPerson('reader').email);
      const token = await t.signIn('reader');
      await t.http.get('/api/auth/me').set(bearer(token)).expect(200); // the guard now holds this user
      await t.http.patch(`/api/users/${reader.id}`).set(bearer(admin)).send({ active: false }).expect(200);
      await t.http.get('/api/auth/me').set(bearer(token)).expect(401);
      await t.http.patch(`/api/users/${reader.id}`).set(bearer(admin)).send({ active: true }).expect(200);
      await t.http.get('/api/auth/me').set(bearer(await t.signIn('reader'))).expect(200);
    });

    it('applies a role change at once, both ways', async () => {
      const author = await byEmail(t.demoPerson('author').email);
      const token = await t.signIn('author');
      await t.http.get('/api/reviewers').set(bearer(token)).expect(200);
      await t.http.patch(`/api/users/${author.id}`).set(bearer(admin)).send({ role: 'reader' }).expect(200);
      await t.http.get('/api/reviewers').set(bearer(token)).expect(403);
      await t.http.patch(`/api/users/${author.id}`).set(bearer(admin)).send({ role: 'author' }).expect(200);
      await t.http.get('/api/reviewers').set(bearer(token)).expect(200);
    });
  });

  it('answers 404 for an unknown user', async () => {
    const response = await t.http.patch('/api/users/0f8e2c53-6a1d-4f4b-9a3e-5b7c2d1e8f90').set(bearer(admin)).send({ name: 'Ghost' }).expect(404);
    expect(response.body.code).toBe('NOT_FOUND');
  });
});
