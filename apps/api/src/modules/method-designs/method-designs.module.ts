import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { LibraryModule } from '../library/library.module.js';
import { MailModule } from '../mail/mail.module.js';
import { MethodsModule } from '../methods/methods.module.js';
import { DemoMethodsSeed } from './demo/demo-methods.seed.js';
import { MethodDesignsStoreModule } from './method-designs-store.module.js';
import { MethodDesignsController } from './method-designs.controller.js';
import { MethodDesignsService } from './method-designs.service.js';
import { MethodUsageController } from './method-usage.controller.js';
import { MethodUsageService } from './method-usage.service.js';

@Module({
  imports: [AuditModule, MailModule, MethodsModule, MethodDesignsStoreModule, LibraryModule],
  controllers: [MethodDesignsController, MethodUsageController],
  providers: [MethodDesignsService, MethodUsageService, DemoMethodsSeed],
})
export class MethodDesignsModule {}
