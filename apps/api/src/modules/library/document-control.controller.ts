import { Controller, Delete, Get, HttpCode, Post } from '@nestjs/common';
import {
  approveRequestSchema,
  compareQuerySchema,
  idParamSchema,
  obsoleteRequestSchema,
  pageRevisionSchema,
  pageSchema,
  revisionCompareSchema,
  revisionHistorySchema,
  revisionParamsSchema,
  sendBackRequestSchema,
  submitForReviewRequestSchema,
  watchedPageListSchema,
  watchStatusSchema,
  type ApproveRequest,
  type CompareQuery,
  type ObsoleteRequest,
  type RevisionParams,
  type SendBackRequest,
  type SubmitForReviewRequest,
} from '@limitbook/contracts';
import { AnySignedIn, CurrentUser, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody, ValidParams, ValidQuery } from '../../common/validation/valid.decorators.js';
import { DocumentControlService } from './document-control.service.js';
import { editorRoles, reviewRoles } from './library-access.js';

@Controller('pages')
export class DocumentControlController {
  constructor(private readonly control: DocumentControlService) {}

  @Post(':id/draft/submit')
  @HttpCode(200)
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Submit the draft for review; each chosen reviewer gets a mail. No edits while in review.', response: pageSchema, tag: 'Document control' })
  submit(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(submitForReviewRequestSchema) body: SubmitForReviewRequest) {
    return this.control.submit(actor, params.id, body);
  }

  @Post(':id/draft/withdraw')
  @HttpCode(200)
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Take the revision in review back to draft', response: pageSchema, tag: 'Document control' })
  withdraw(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    return this.control.withdraw(actor, params.id);
  }

  @Post(':id/draft/approve')
  @HttpCode(200)
  @Roles(...reviewRoles)
  @ApiContract({
    summary: 'Approve the revision in review: it is released with the next revision letter and supersedes the previous release; watchers get a mail',
    description: 'Refused with 403 for anyone who created, edited or submitted the revision.',
    response: pageSchema,
    tag: 'Document control',
  })
  approve(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(approveRequestSchema) body: ApproveRequest) {
    return this.control.approve(actor, params.id, body);
  }

  @Post(':id/draft/send-back')
  @HttpCode(200)
  @Roles(...reviewRoles)
  @ApiContract({ summary: 'Send the revision in review back to draft with a comment; the author gets a mail', response: pageSchema, tag: 'Document control' })
  sendBack(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(sendBackRequestSchema) body: SendBackRequest) {
    return this.control.sendBack(actor, params.id, body);
  }

  @Get(':id/revisions')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Revision history, newest first; readers see released and superseded revisions only', response: revisionHistorySchema, tag: 'Document control' })
  history(@CurrentUser() user: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    return this.control.history(user, params.id);
  }

  @Get(':id/revisions/:revisionId')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'One revision with its body', response: pageRevisionSchema, tag: 'Document control' })
  revision(@CurrentUser() user: AuthUser, @ValidParams(revisionParamsSchema) params: RevisionParams) {
    return this.control.revision(user, params.id, params.revisionId);
  }

  @Post(':id/revisions/:revisionId/restore')
  @HttpCode(200)
  @Roles('admin')
  @ApiContract({ summary: "Start a new draft from a released or superseded revision's content (409 while a draft or review is open)", response: pageSchema, tag: 'Document control' })
  restore(@CurrentUser() actor: AuthUser, @ValidParams(revisionParamsSchema) params: RevisionParams) {
    return this.control.restore(actor, params.id, params.revisionId);
  }

  @Get(':id/compare')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Compare two revisions: title, text lines and calculator-block settings', response: revisionCompareSchema, tag: 'Document control' })
  compare(@CurrentUser() user: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidQuery(compareQuerySchema) query: CompareQuery) {
    return this.control.compare(user, params.id, query.from, query.to);
  }

  @Post(':id/obsolete')
  @HttpCode(200)
  @Roles('admin')
  @ApiContract({ summary: 'Mark the page obsolete: hidden from lists and search, still readable with the reason', response: pageSchema, tag: 'Document control' })
  obsolete(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(obsoleteRequestSchema) body: ObsoleteRequest) {
    return this.control.obsolete(actor, params.id, body.reason);
  }

  @Post(':id/reinstate')
  @HttpCode(200)
  @Roles('admin')
  @ApiContract({ summary: 'Reinstate an obsolete page', response: pageSchema, tag: 'Document control' })
  reinstate(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    return this.control.reinstate(actor, params.id);
  }

  @Post(':id/watch')
  @HttpCode(200)
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Watch the page: mail on every new release', response: watchStatusSchema, tag: 'Document control' })
  watch(@CurrentUser() user: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    return this.control.watch(user, params.id, true);
  }

  @Delete(':id/watch')
  @HttpCode(200)
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Stop watching the page', response: watchStatusSchema, tag: 'Document control' })
  unwatch(@CurrentUser() user: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    return this.control.watch(user, params.id, false);
  }
}

@Controller('watching')
export class WatchingController {
  constructor(private readonly control: DocumentControlService) {}

  @Get()
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Pages I watch', response: watchedPageListSchema, tag: 'Document control' })
  list(@CurrentUser() user: AuthUser) {
    return this.control.watched(user);
  }
}
