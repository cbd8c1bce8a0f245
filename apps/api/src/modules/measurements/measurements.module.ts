import { Module } from '@nestjs/common';
import { CsvUploadInterceptor } from './csv-upload.interceptor.js';
import { MeasurementsController } from './measurements.controller.js';
import { MeasurementsService } from './measurements.service.js';

@Module({
  controllers: [MeasurementsController],
  providers: [MeasurementsService, CsvUploadInterceptor],
})
export class MeasurementsModule {}
