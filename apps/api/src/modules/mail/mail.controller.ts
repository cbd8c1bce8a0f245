import { Controller, Get } from '@nestjs/common';
import { capturedMailListSchema, capturedMailSchema, idParamSchema, pageQuerySchema, type PageQuery } from '@limitbook/contracts';
import { Roles } from '../../common/auth/access.decorators.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidParams, ValidQuery } from '../../common/validation/valid.decorators.js';
import { MailService } from './mail.service.js';

@Controller('mail')
@Roles('admin')
export class MailController {
  constructor(private readonly mail: MailService) {}

  @Get()
  @ApiContract({ summary: 'List mail caught by the local SMTP catcher, newest first', response: capturedMailListSchema, tag: 'Mail' })
  list(@ValidQuery(pageQuerySchema) query: PageQuery) {
    return this.mail.listCaptured(query);
  }

  @Get(':id')
  @ApiContract({ summary: 'Read one caught message', response: capturedMailSchema, tag: 'Mail' })
  get(@ValidParams(idParamSchema) params: { id: string }) {
    return this.mail.getCaptured(params.id);
  }
}
