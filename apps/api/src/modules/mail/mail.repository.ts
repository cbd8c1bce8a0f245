import { Inject, Injectable } from '@nestjs/common';
import { count, desc, eq } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database } from '../../database/database.js';
import { capturedMail, type CapturedMailRow, type NewCapturedMailRow } from '../../database/schema/index.js';

@Injectable()
export class MailRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insert(mail: NewCapturedMailRow): Promise<CapturedMailRow> {
    const [row] = await this.db.insert(capturedMail).values(mail).returning();
    return row!;
  }

  async list(limit: number, offset: number): Promise<{ rows: Omit<CapturedMailRow, 'text' | 'html'>[]; total: number }> {
    const [rows, [totals]] = await Promise.all([
      this.db
        .select({ id: capturedMail.id, receivedAt: capturedMail.receivedAt, from: capturedMail.from, to: capturedMail.to, subject: capturedMail.subject, sizeBytes: capturedMail.sizeBytes })
        .from(capturedMail)
        .orderBy(desc(capturedMail.receivedAt), desc(capturedMail.id))
        .limit(limit)
        .offset(offset),
      this.db.select({ total: count() }).from(capturedMail),
    ]);
    return { rows, total: totals?.total ?? 0 };
  }

  async find(id: string): Promise<CapturedMailRow | undefined> {
    const [row] = await this.db.select().from(capturedMail).where(eq(capturedMail.id, id));
    return row;
  }
}
