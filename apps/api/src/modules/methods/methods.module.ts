import { Module } from '@nestjs/common';
import { MethodDesignsStoreModule } from '../method-designs/method-designs-store.module.js';
import { MethodsController } from './methods.controller.js';
import { MethodsService } from './methods.service.js';

@Module({
  imports: [MethodDesignsStoreModule],
  controllers: [MethodsController],
  providers: [MethodsService],
  exports: [MethodsService],
})
export class MethodsModule {}
