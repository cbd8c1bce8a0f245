import { Injectable } from '@nestjs/common';
import apiPackage from '../../../package.json' with { type: 'json' };
import { type Health } from './dto/health.dto.js';
import { HealthRepository } from './health.repository.js';

@Injectable()
export class HealthService {
  constructor(private readonly repository: HealthRepository) {}

  /** Fails (500) when the database does not answer, so a load balancer takes the process out. */
  async check(): Promise<Health> {
    await this.repository.ping();
    return { status: 'ok', database: this.repository.driver, version: apiPackage.version };
  }
}
