import { composeMail, type MailContent } from './layout.js';

export function passwordResetMail(input: { name: string; url: string; validMinutes: number }): MailContent {
  return composeMail({
    subject: 'Reset your Limitbook password',
    greeting: `Hello ${input.name},`,
    paragraphs: [
      'Someone, hopefully you, asked to reset the password of your Limitbook account.',
      `The link below lets you choose a new one. It works once and for ${input.validMinutes} minutes; signing in with it ends your other sessions.`,
    ],
    action: { label: 'Choose a new password', url: input.url },
    footer: 'If you did not ask for this, ignore this message: your password stays as it is.',
  });
}
