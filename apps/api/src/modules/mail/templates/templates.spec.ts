import { describe, expect, it } from 'vitest';
import { invitationMail } from './invitation.mail.js';
import { passwordResetMail } from './password-reset.mail.js';

describe('mail templates', () => {
  it('carry the link in both parts and escape names in HTML', () => {
    const mail = passwordResetMail({ name: 'Ada <script>', url: 'http://lb.test/reset-password?token=abc&x=1', validMinutes: 60 });
    expect(mail.text).toContain('http://lb.test/reset-password?token=abc&x=1');
    expect(mail.html).toContain('href="http://lb.test/reset-password?token=abc&amp;x=1"');
    expect(mail.html).toContain('Ada &lt;script&gt;');
    expect(mail.html).not.toContain('<script>');
  });

  it('names the role an invitation grants', () => {
    const mail = invitationMail({ inviterName: 'Maren Holt', role: 'reviewer', url: 'http://lb.test/accept-invite?token=t', validDays: 7 });
    expect(mail.subject).toContain('Limitbook');
    expect(mail.text).toContain('Reviewer role');
  });
});
