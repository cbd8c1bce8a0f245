import { composeMail, type MailContent } from '../mail/templates/layout.js';

export function impactMail(input: { name: string; documentNumber: string; title: string; records: { url: string; label: string }[]; listUrl: string }): MailContent {
  const count = input.records.length;
  return composeMail({
    subject: `${input.documentNumber}: a new revision changes ${count === 1 ? 'one of your calculation records' : `${count} of your calculation records`}`,
    greeting: `Hello ${input.name},`,
    paragraphs: [
      `${input.documentNumber} ${input.title} has a new revision whose calculator settings differ from the one you recorded under. Re-run with the new settings, ${count === 1 ? 'this record gives' : 'these records give'} a different verdict or result:`,
      ...input.records.map((record) => `${record.label}: ${record.url}`),
      'Your records stay as they were saved; check whether the parts they cover need a new calculation.',
    ],
    action: { label: 'Open your records', url: input.listUrl },
    footer: 'You receive this because you saved these records in Limitbook.',
  });
}
