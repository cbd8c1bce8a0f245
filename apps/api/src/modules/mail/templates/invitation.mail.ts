import { roleLabels, type Role } from '@limitbook/contracts';
import { composeMail, type MailContent } from './layout.js';

export function invitationMail(input: { inviterName: string; role: Role; url: string; validDays: number }): MailContent {
  return composeMail({
    subject: 'You have been invited to Limitbook',
    greeting: 'Hello,',
    paragraphs: [
      `${input.inviterName} has given you access to your team's tolerancing standards in Limitbook, with the ${roleLabels[input.role]} role.`,
      `Open the link below to choose your password. It works once and for ${input.validDays} days.`,
    ],
    action: { label: 'Set your password', url: input.url },
    footer: 'Not expecting this? You can ignore this message; no account is usable until the link is opened.',
  });
}
