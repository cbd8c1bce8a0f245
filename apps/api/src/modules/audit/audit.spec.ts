import { type AuditList } from '@limitbook/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { AuditService } from './audit.service.js';

describe('audit log', () => {
  let t: TestApp;
  let admin: string;
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.signIn('admin');
    const audit = t.app.get(AuditService);
    await audit.record({ actor: null, action: 'test.formula', subjectType: 'page', subjectId: '=HYPERLINK("http://evil.example","x")', detail: { note: 'a, "quoted"\nline' } });
    await audit.record({ actor: null, action: 'test.other', subjectType: 'page', subjectId: 'BW-STD-101' });
  });
  afterAll(async () => {
    await t?.close();
  });

  it('filters by action and pages newest first', async () => {
    const filtered = (await t.http.get('/api/audit?action=test.other').set(bearer(admin)).expect(200)).body as AuditList;
    expect(filtered.total).toBe(1);
    expect(filtered.items[0]).toMatchObject({ action: 'test.other', subjectId: 'BW-STD-101', actorId: null });
    const page = (await t.http.get('/api/audit?limit=1').set(bearer(admin)).expect(200)).body as AuditList;
    expect(page.items).toHaveLength(1);
    expect(page.items[0]!.action).toBe('test.other');
    const none = (await t.http.get(`/api/audit?from=${encodeURIComponent(new Date(Date.now() + 60_000).toISOString())}`).set(bearer(admin)).expect(200)).body as AuditList;
    expect(none.total).toBe(0);
  });

  it('exports CSV that a spreadsheet will not run as formulas', async () => {
    const response = await t.http.get('/api/audit/export.csv?action=test.formula').set(bearer(admin)).expect(200);
    expect(response.headers['content-type']).toMatch(/^text\/csv/);
    expect(response.headers['content-disposition']).toMatch(/attachment/);
    const lines = response.text.split('\r\n');
    expect(lines[0]).toBe('at,actor_email,actor_id,action,subject_type,subject_id,detail');
    expect(response.text).toContain(`"'=HYPERLINK(""http://evil.example"",""x"")"`);
    expect(response.text).toContain('"{""note"":""a, \\""quoted\\""\\nline""}"');
  });
});
