import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { MethodsModule } from '../methods/methods.module.js';
import { ImpactController, RecordsController } from './records.controller.js';
import { RecordsRepository } from './records.repository.js';
import { RecordsService } from './records.service.js';

/** Calculation records and the impact check; `RecordsService.checkImpact` is what a release calls. */
@Module({
  imports: [MethodsModule, AuditModule],
  controllers: [RecordsController, ImpactController],
  providers: [RecordsService, RecordsRepository],
  exports: [RecordsService],
})
export class RecordsModule {}
