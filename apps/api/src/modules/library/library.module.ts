import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { FilesModule } from '../files/files.module.js';
import { MailModule } from '../mail/mail.module.js';
import { RecordsModule } from '../records/records.module.js';
import { CollectionsController } from './collections.controller.js';
import { CollectionsRepository } from './collections.repository.js';
import { CollectionsService } from './collections.service.js';
import { DemoLibrarySeed } from './demo/demo-library.seed.js';
import { DocumentControlController, WatchingController } from './document-control.controller.js';
import { DocumentControlService } from './document-control.service.js';
import { PagesController, TagsController } from './pages.controller.js';
import { PagesRepository } from './pages.repository.js';
import { PagesService } from './pages.service.js';

@Module({
  imports: [AuditModule, FilesModule, MailModule, RecordsModule],
  controllers: [CollectionsController, PagesController, TagsController, DocumentControlController, WatchingController],
  providers: [CollectionsRepository, CollectionsService, PagesRepository, PagesService, DocumentControlService, DemoLibrarySeed],
  exports: [PagesService],
})
export class LibraryModule {}
