import { type Page, type Role } from '@limitbook/contracts';
import { eq } from 'drizzle-orm';
import { users } from '../../../database/schema/index.js';
import { type TestApp } from '../../../testing/test-app.js';

/** The id of a demo person, read from the database. */
export async function demoUserId(t: TestApp, role: Role): Promise<string> {
  const [row] = await t.db.select({ id: users.id }).from(users).where(eq(users.email, t.demoPerson(role).email));
  return row!.id;
}

/** Submits the page's draft as `submitter` to the demo reviewer, who approves it; returns the released page. */
export async function releasePage(t: TestApp, pageId: string, tokens: { submitter: string; approver: string }, reviewerIds?: string[]): Promise<Page> {
  const auth = (token: string) => ({ Authorization: `Bearer ${token}` });
  const ids = reviewerIds ?? [await demoUserId(t, 'reviewer')];
  const submitted = await t.http.post(`/api/pages/${pageId}/draft/submit`).set(auth(tokens.submitter)).send({ reviewerIds: ids });
  if (submitted.status !== 200) throw new Error(`submit: ${submitted.status} ${JSON.stringify(submitted.body)}`);
  const baseVersion = (submitted.body as Page).revision.version;
  const approved = await t.http.post(`/api/pages/${pageId}/draft/approve`).set(auth(tokens.approver)).send({ baseVersion });
  if (approved.status !== 200) throw new Error(`approve: ${approved.status} ${JSON.stringify(approved.body)}`);
  return approved.body as Page;
}
