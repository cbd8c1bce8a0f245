import { Module } from '@nestjs/common';
import { MethodDesignsRepository } from './method-designs.repository.js';

/**
 * The in-house methods' storage on its own, so the methods module can read released designs
 * for evaluation while the designer module (which needs the methods module) builds on both.
 */
@Module({
  providers: [MethodDesignsRepository],
  exports: [MethodDesignsRepository],
})
export class MethodDesignsStoreModule {}
