import { type CapturedMail, type CapturedMailList } from '@limitbook/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { MailService } from './mail.service.js';

describe('captured mail', () => {
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

  it('stores what nodemailer sends over SMTP and lets admins read it', async () => {
    await t.app.get(MailService).send({ to: 'Idris.Okafor@brackwater.example', subject: 'Review requested: BW-STD-101 rev C', text: 'Please review.', html: '<p>Please <b>review</b>.</p>' });
    const list = (await t.http.get('/api/mail').set(bearer(admin)).expect(200)).body as CapturedMailList;
    const summary = list.items.find((mail) => mail.subject === 'Review requested: BW-STD-101 rev C');
    expect(summary).toMatchObject({ to: ['Idris.Okafor@brackwater.example'], from: expect.stringContaining('limitbook@localhost') });

    const mail = (await t.http.get(`/api/mail/${summary!.id}`).set(bearer(admin)).expect(200)).body as CapturedMail;
    expect(mail.text.trim()).toBe('Please review.');
    expect(mail.html).toContain('<b>review</b>');
  });

  it('answers 404 for an unknown message', async () => {
    await t.http.get('/api/mail/0f8e2c53-6a1d-4f4b-9a3e-5b7c2d1e8f90').set(bearer(admin)).expect(404);
  });
});
