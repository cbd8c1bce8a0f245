import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { FilesModule } from '../files/files.module.js';
import { CollectionsController } from './collections.controller.js';
import { CollectionsRepository } from './collections.repository.js';
import { CollectionsService } from './collections.service.js';
import { DemoLibrarySeed } from './demo/demo-library.seed.js';
import { PagesController, TagsController } from './pages.controller.js';
import { PagesRepository } from './pages.repository.js';
import { PagesService } from './pages.service.js';

@Module({
  imports: [AuditModule, FilesModule],
  controllers: [CollectionsController, PagesController, TagsController],
  providers: [CollectionsRepository, CollectionsService, PagesRepository, PagesService, DemoLibrarySeed],
  exports: [PagesService],
})
export class LibraryModule {}
