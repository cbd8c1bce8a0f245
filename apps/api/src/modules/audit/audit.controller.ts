import { Controller, Get, Header } from '@nestjs/common';
import { auditListSchema, auditQuerySchema, type AuditQuery } from '@limitbook/contracts';
import { Roles } from '../../common/auth/access.decorators.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidQuery } from '../../common/validation/valid.decorators.js';
import { AuditService } from './audit.service.js';
import { auditExportQuerySchema, type AuditExportQuery } from './dto/audit-export-query.js';

@Controller('audit')
@Roles('admin')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @ApiContract({ summary: 'List audit events, newest first', response: auditListSchema, tag: 'Audit' })
  list(@ValidQuery(auditQuerySchema) query: AuditQuery) {
    return this.audit.list(query);
  }

  @Get('export.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="limitbook-audit.csv"')
  @ApiContract({ summary: 'Export audit events as CSV', contentType: 'text/csv', tag: 'Audit' })
  exportCsv(@ValidQuery(auditExportQuerySchema) query: AuditExportQuery) {
    return this.audit.exportCsv(query);
  }
}
