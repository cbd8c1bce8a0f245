import { Controller, Get, Header, HttpCode, Post, StreamableFile } from '@nestjs/common';
import {
  calculationRecordSchema,
  createRecordRequestSchema,
  idParamSchema,
  impactCheckRequestSchema,
  impactReportSchema,
  recordFilterSchema,
  recordListQuerySchema,
  recordImpactListSchema,
  recordListSchema,
  releaseImpactSchema,
  revisionParamsSchema,
  type CreateRecordRequest,
  type ImpactCheckRequest,
  type RecordFilter,
  type RecordListQuery,
  type RevisionParams,
} from '@limitbook/contracts';
import { AnySignedIn, CurrentUser, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody, ValidParams, ValidQuery } from '../../common/validation/valid.decorators.js';
import { RecordsService } from './records.service.js';

// Fixed paths (`export.csv`, `:id.pdf`) are declared before `:id`, which would otherwise take them.
@Controller('records')
@Roles(...AnySignedIn)
export class RecordsController {
  constructor(private readonly records: RecordsService) {}

  @Post()
  @ApiContract({ summary: "Save a calculator block's run; the server evaluates it again with the page's method, rule and locked inputs", response: calculationRecordSchema, status: 201, tag: 'Records' })
  create(@CurrentUser() actor: AuthUser, @ValidBody(createRecordRequestSchema) body: CreateRecordRequest) {
    return this.records.create(actor, body);
  }

  @Get()
  @ApiContract({ summary: 'List your records, newest first (admins: `scope=all` for everyone\'s)', response: recordListSchema, tag: 'Records' })
  list(@CurrentUser() user: AuthUser, @ValidQuery(recordListQuerySchema) query: RecordListQuery) {
    return this.records.list(user, query);
  }

  @Get('export.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="limitbook-records.csv"')
  @ApiContract({ summary: 'Export the filtered records as CSV', contentType: 'text/csv', tag: 'Records' })
  exportCsv(@CurrentUser() user: AuthUser, @ValidQuery(recordFilterSchema) query: RecordFilter) {
    return this.records.exportCsv(user, query);
  }

  @Get(':id.pdf')
  @ApiContract({ summary: 'One record as a PDF with the derivation rendered', contentType: 'application/pdf', tag: 'Records' })
  async pdf(@ValidParams(idParamSchema) params: { id: string }) {
    const { file, filename } = await this.records.pdf(params.id);
    return new StreamableFile(file, { type: 'application/pdf', disposition: `attachment; filename="${filename}"`, length: file.length });
  }

  @Get(':id/impact')
  @ApiContract({ summary: 'Later releases under which this record comes out differently (from their impact checks)', response: recordImpactListSchema, tag: 'Records' })
  impact(@ValidParams(idParamSchema) params: { id: string }) {
    return this.records.recordImpact(params.id);
  }

  @Get(':id')
  @ApiContract({ summary: 'One record: what its permalink shows', response: calculationRecordSchema, tag: 'Records' })
  get(@ValidParams(idParamSchema) params: { id: string }) {
    return this.records.get(params.id);
  }
}

@Controller()
@Roles('author', 'admin')
export class ImpactController {
  constructor(private readonly records: RecordsService) {}

  @Post('pages/:id/impact')
  @HttpCode(201)
  @ApiContract({
    summary: 'Re-run the records of one revision under the calculator settings of another and report the ones whose verdict or key outputs change',
    description: 'Owners of affected records get one mail each. The same check runs when a revision is released.',
    response: impactReportSchema,
    status: 201,
    tag: 'Records',
  })
  check(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(impactCheckRequestSchema) body: ImpactCheckRequest) {
    return this.records.checkImpact(params.id, body.fromRevisionId, body.toRevisionId, actor);
  }

  @Get('pages/:id/revisions/:revisionId/impact')
  @Roles('author', 'reviewer', 'admin')
  @ApiContract({
    summary: "A release's impact check: `pending` while the check run by the approval is still working, `none` for a first release",
    response: releaseImpactSchema,
    tag: 'Records',
  })
  releaseImpact(@ValidParams(revisionParamsSchema) params: RevisionParams) {
    return this.records.releaseImpact(params.id, params.revisionId);
  }

  @Get('impact-reports/:id')
  @ApiContract({ summary: 'A stored impact report', response: impactReportSchema, tag: 'Records' })
  report(@ValidParams(idParamSchema) params: { id: string }) {
    return this.records.getImpactReport(params.id);
  }
}
