import { Inject, Injectable } from '@nestjs/common';
import { DRIZZLE } from '../database/database.module.js';
import { type Database } from '../database/database.js';
import { users } from '../database/schema/index.js';

@Injectable()
export class SeedRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /** No users means a fresh database: nobody could sign in to load anything. */
  async isEmpty(): Promise<boolean> {
    const rows = await this.db.select({ id: users.id }).from(users).limit(1);
    return rows.length === 0;
  }
}
