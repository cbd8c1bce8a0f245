import { Controller, Get } from '@nestjs/common';
import { Public } from '../../common/auth/access.decorators.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { healthSchema } from './dto/health.dto.js';
import { HealthService } from './health.service.js';

@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Get()
  @Public()
  @ApiContract({ summary: 'Liveness and database check', response: healthSchema, tag: 'Health' })
  check() {
    return this.health.check();
  }
}
