import { composeMail, type MailContent } from './layout.js';

interface PageRef {
  documentNumber: string;
  title: string;
  url: string;
}

export function reviewRequestMail(input: PageRef & { authorName: string; note: string | null }): MailContent {
  return composeMail({
    subject: `Review requested: ${input.documentNumber} ${input.title}`,
    greeting: 'Hello,',
    paragraphs: [
      `${input.authorName} asks you to review the next revision of ${input.documentNumber} "${input.title}".`,
      ...(input.note ? [`Their note: ${input.note}`] : []),
      'Approve it to release it, or send it back with a comment saying what needs to change.',
    ],
    action: { label: 'Open the revision', url: input.url },
    footer: 'You get this because you were chosen as a reviewer in Limitbook.',
  });
}

export function sentBackMail(input: PageRef & { reviewerName: string; comment: string }): MailContent {
  return composeMail({
    subject: `Sent back: ${input.documentNumber} ${input.title}`,
    greeting: 'Hello,',
    paragraphs: [`${input.reviewerName} sent the revision of ${input.documentNumber} "${input.title}" back to draft.`, `Their comment: ${input.comment}`],
    action: { label: 'Open the draft', url: input.url },
    footer: 'You get this because you submitted this revision for review.',
  });
}

export function releaseNoticeMail(input: PageRef & { revisionLetter: string; approverName: string }): MailContent {
  return composeMail({
    subject: `Released: ${input.documentNumber} revision ${input.revisionLetter}`,
    greeting: 'Hello,',
    paragraphs: [`Revision ${input.revisionLetter} of ${input.documentNumber} "${input.title}" has been released, approved by ${input.approverName}. It replaces the previous revision.`],
    action: { label: `Read revision ${input.revisionLetter}`, url: input.url },
    footer: 'You get this because you watch this page. Stop watching it from the page to receive no more notices.',
  });
}
