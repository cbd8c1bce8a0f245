import { type ReviewerList } from '@limitbook/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

describe('reviewers (for picking who reviews a draft)', () => {
  let t: TestApp;
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => {
    await t?.close();
  });

  it('lists active reviewers and admins to an author, without authors or readers', async () => {
    const author = await t.signIn('author');
    const { items } = (await t.http.get('/api/reviewers').set(bearer(author)).expect(200)).body as ReviewerList;
    const emails = items.map((item) => item.email);
    expect(emails).toEqual(expect.arrayContaining([t.demoPerson('reviewer').email, t.demoPerson('admin').email]));
    expect(emails).not.toContain(t.demoPerson('author').email);
    expect(emails).not.toContain(t.demoPerson('reader').email);
    expect(items.every((item) => item.role === 'reviewer' || item.role === 'admin')).toBe(true);
    expect(Object.keys(items[0]!).sort()).toEqual(['email', 'id', 'name', 'role']);
  });

  it('leaves out a deactivated reviewer', async () => {
    const admin = await t.signIn('admin');
    const { items } = (await t.http.get('/api/reviewers').set(bearer(admin)).expect(200)).body as ReviewerList;
    const reviewer = items.find((item) => item.email === t.demoPerson('reviewer').email)!;
    await t.http.patch(`/api/users/${reviewer.id}`).set(bearer(admin)).send({ active: false }).expect(200);
    try {
      const after = (await t.http.get('/api/reviewers').set(bearer(admin)).expect(200)).body as ReviewerList;
      expect(after.items.map((item) => item.id)).not.toContain(reviewer.id);
    } finally {
      await t.http.patch(`/api/users/${reviewer.id}`).set(bearer(admin)).send({ active: true }).expect(200);
    }
  });

  it('refuses readers and reviewers', async () => {
    await t.http.get('/api/reviewers').set(bearer(await t.signIn('reader'))).expect(403);
    await t.http.get('/api/reviewers').set(bearer(await t.signIn('reviewer'))).expect(403);
  });
});
