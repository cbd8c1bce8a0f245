import { Inject, Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DATABASE_HANDLE } from '../../database/database.module.js';
import { type DatabaseHandle } from '../../database/database.js';

@Injectable()
export class HealthRepository {
  constructor(@Inject(DATABASE_HANDLE) private readonly handle: DatabaseHandle) {}

  get driver(): DatabaseHandle['driver'] {
    return this.handle.driver;
  }

  async ping(): Promise<void> {
    await this.handle.db.execute(sql`select 1`);
  }
}
