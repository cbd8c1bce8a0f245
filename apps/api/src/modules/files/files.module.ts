import { join } from 'node:path';
import { Module } from '@nestjs/common';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { AuditModule } from '../audit/audit.module.js';
import { FILE_STORAGE, LocalFileStorage } from './file-storage.js';
import { FilesController } from './files.controller.js';
import { FilesRepository } from './files.repository.js';
import { FilesService } from './files.service.js';
import { UploadInterceptor } from './upload.interceptor.js';

@Module({
  imports: [AuditModule],
  controllers: [FilesController],
  providers: [
    FilesRepository,
    FilesService,
    UploadInterceptor,
    { provide: FILE_STORAGE, inject: [APP_CONFIG], useFactory: (config: ResolvedConfig) => new LocalFileStorage(join(config.dataDir, 'files')) },
  ],
  exports: [FilesService],
})
export class FilesModule {}
