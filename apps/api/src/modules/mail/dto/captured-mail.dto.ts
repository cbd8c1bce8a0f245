import { type CapturedMail, type CapturedMailSummary } from '@limitbook/contracts';
import { type CapturedMailRow } from '../../../database/schema/index.js';

export function toMailSummary(row: Pick<CapturedMailRow, 'id' | 'from' | 'to' | 'subject' | 'receivedAt'>): CapturedMailSummary {
  return { id: row.id, from: row.from, to: row.to, subject: row.subject, receivedAt: row.receivedAt.toISOString() };
}

export function toMail(row: CapturedMailRow): CapturedMail {
  return { ...toMailSummary(row), text: row.text, html: row.html };
}
