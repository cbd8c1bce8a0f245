import { Controller, HttpCode, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { maxTableImportBytes, tableImportParamsSchema, tableImportQuerySchema, tableImportResultSchema, type TableImportParams, type TableImportQuery } from '@limitbook/contracts';
import { AnySignedIn, Roles } from '../../common/auth/access.decorators.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidParams, ValidQuery } from '../../common/validation/valid.decorators.js';
import { CsvUploadInterceptor } from './csv-upload.interceptor.js';
import { MeasurementsService, type UploadedCsv } from './measurements.service.js';

@Controller('methods')
@Roles(...AnySignedIn)
export class MeasurementsController {
  constructor(private readonly measurements: MeasurementsService) {}

  @Post(':id/tables/:input/import')
  @HttpCode(200)
  @UseInterceptors(CsvUploadInterceptor)
  @ApiContract({
    summary: `Read a CSV (multipart/form-data, field \`file\`, at most ${maxTableImportBytes / (1024 * 1024)} MB) into rows of a method's table input`,
    description:
      'Headers are matched to the row fields by name or alias, case-insensitively; a `unit` column or a header suffix such as `[mm]` or `(in)` gives the unit of lengths, ' +
      'which are returned in `unit`. Rows failing validation are listed in `problems` with their line in the file; the others are returned. Nothing is stored.',
    response: tableImportResultSchema,
    tag: 'Methods',
  })
  import(@ValidParams(tableImportParamsSchema) params: TableImportParams, @ValidQuery(tableImportQuerySchema) query: TableImportQuery, @UploadedFile() file: UploadedCsv | undefined) {
    return this.measurements.importTable(params.id, params.input, file, query.unit);
  }
}
