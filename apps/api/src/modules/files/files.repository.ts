import { Inject, Injectable } from '@nestjs/common';
import { eq } from 'drizzle-orm';
import { DRIZZLE } from '../../database/database.module.js';
import { type Database } from '../../database/database.js';
import { type NewStoredFileRow, storedFiles, type StoredFileRow, users } from '../../database/schema/index.js';

@Injectable()
export class FilesRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insert(values: NewStoredFileRow): Promise<StoredFileRow> {
    const [row] = await this.db.insert(storedFiles).values(values).returning();
    return row!;
  }

  async findById(id: string): Promise<StoredFileRow | undefined> {
    const [row] = await this.db.select().from(storedFiles).where(eq(storedFiles.id, id));
    return row;
  }

  async findPerson(id: string): Promise<{ id: string; name: string; email: string } | undefined> {
    const [row] = await this.db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.id, id));
    return row;
  }

  async isActiveUser(id: string): Promise<boolean> {
    const [row] = await this.db.select({ status: users.status }).from(users).where(eq(users.id, id));
    return row?.status === 'active';
  }
}
