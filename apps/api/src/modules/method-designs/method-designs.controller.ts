import { Controller, Delete, Get, HttpCode, Post, Put } from '@nestjs/common';
import {
  approveRequestSchema,
  createMethodDesignRequestSchema,
  methodCompareQuerySchema,
  methodCompareSchema,
  methodDesignListSchema,
  methodDesignParamsSchema,
  methodDesignSchema,
  methodPreviewRequestSchema,
  methodPreviewResponseSchema,
  methodRevisionSchema,
  methodVersionListSchema,
  methodVersionParamsSchema,
  parseMethodVersion,
  saveMethodDraftRequestSchema,
  sendBackRequestSchema,
  submitForReviewRequestSchema,
  testRunSchema,
  type ApproveRequest,
  type CreateMethodDesignRequest,
  type DesignDefinition,
  type MethodCompareQuery,
  type MethodDesignParams,
  type MethodVersionParams,
  type SendBackRequest,
  type SubmitForReviewRequest,
} from '@limitbook/contracts';
import { AnySignedIn, CurrentUser, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody, ValidParams, ValidQuery } from '../../common/validation/valid.decorators.js';
import { editorRoles, reviewRoles } from '../library/library-access.js';
import { MethodDesignsService } from './method-designs.service.js';

const tag = 'In-house methods';
/** Open revisions are read by those who write them and those who review them. */
const draftReaders = ['admin', 'author', 'reviewer'] as const;

@Controller('method-designs')
export class MethodDesignsController {
  constructor(private readonly designs: MethodDesignsService) {}

  @Get()
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'In-house methods; readers see released ones only', response: methodDesignListSchema, tag })
  list(@CurrentUser() user: AuthUser) {
    return this.designs.list(user);
  }

  @Post()
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Create an in-house method (house:<slug>) with its first draft', response: methodDesignSchema, status: 201, tag })
  create(@CurrentUser() actor: AuthUser, @ValidBody(createMethodDesignRequestSchema) body: CreateMethodDesignRequest) {
    return this.designs.create(actor, body);
  }

  @Post('preview')
  @HttpCode(200)
  @Roles(...editorRoles)
  @ApiContract({
    summary: 'Evaluate an unsaved definition with the given values; problems come back as a 400 per field with the TeX of each expression that parsed',
    response: methodPreviewResponseSchema,
    tag,
  })
  preview(@ValidBody(methodPreviewRequestSchema) body: { definition: DesignDefinition; values: Record<string, number | string> }) {
    return this.designs.preview(body.definition, body.values);
  }

  @Get(':slug')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'One in-house method with its latest released version', response: methodDesignSchema, tag })
  get(@CurrentUser() user: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams) {
    return this.designs.get(user, params.slug);
  }

  @Post(':slug/draft')
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Start a draft of the next version from the latest release (409 while one is open)', response: methodRevisionSchema, status: 201, tag })
  startDraft(@CurrentUser() actor: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams) {
    return this.designs.startDraft(actor, params.slug);
  }

  @Get(':slug/draft')
  @Roles(...draftReaders)
  @ApiContract({ summary: 'The open version (draft, or in review) with its formula problems and TeX', response: methodRevisionSchema, tag })
  draft(@CurrentUser() user: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams) {
    return this.designs.getDraft(user, params.slug);
  }

  @Put(':slug/draft')
  @Roles(...editorRoles)
  @ApiContract({
    summary: 'Save the draft over baseVersion (409 when stale); formulas the sandbox refuses are a 400, other problems are kept and listed',
    response: methodRevisionSchema,
    tag,
  })
  saveDraft(
    @CurrentUser() actor: AuthUser,
    @ValidParams(methodDesignParamsSchema) params: MethodDesignParams,
    @ValidBody(saveMethodDraftRequestSchema) body: { baseVersion: number; definition: DesignDefinition },
  ) {
    return this.designs.saveDraft(actor, params.slug, body.baseVersion, body.definition);
  }

  @Delete(':slug/draft')
  @HttpCode(204)
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Discard the draft (a method never released goes with it)', status: 204, tag })
  async deleteDraft(@CurrentUser() actor: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams) {
    await this.designs.deleteDraft(actor, params.slug);
  }

  @Post(':slug/draft/run-tests')
  @HttpCode(200)
  @Roles(...draftReaders)
  @ApiContract({ summary: "Run the open version's test table: pass/fail per row with differences", response: testRunSchema, tag })
  runTests(@CurrentUser() user: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams) {
    return this.designs.runTests(user, params.slug);
  }

  @Post(':slug/draft/submit')
  @HttpCode(200)
  @Roles(...editorRoles)
  @ApiContract({
    summary: 'Submit the draft for review; refused (400, `tests.<row>`) unless it has test rows and every one passes',
    response: methodRevisionSchema,
    tag,
  })
  submit(@CurrentUser() actor: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams, @ValidBody(submitForReviewRequestSchema) body: SubmitForReviewRequest) {
    return this.designs.submit(actor, params.slug, body);
  }

  @Post(':slug/draft/withdraw')
  @HttpCode(200)
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Take the version in review back to draft', response: methodRevisionSchema, tag })
  withdraw(@CurrentUser() actor: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams) {
    return this.designs.withdraw(actor, params.slug);
  }

  @Post(':slug/draft/approve')
  @HttpCode(200)
  @Roles(...reviewRoles)
  @ApiContract({
    summary: 'Approve the version in review: released as the next version number, superseding the previous release',
    description: 'Refused with 403 for anyone who created, edited or submitted it; 409 when baseVersion is not the version in review.',
    response: methodRevisionSchema,
    tag,
  })
  approve(@CurrentUser() actor: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams, @ValidBody(approveRequestSchema) body: ApproveRequest) {
    return this.designs.approve(actor, params.slug, body);
  }

  @Post(':slug/draft/send-back')
  @HttpCode(200)
  @Roles(...reviewRoles)
  @ApiContract({ summary: 'Send the version in review back to draft with a comment; the author gets a mail', response: methodRevisionSchema, tag })
  sendBack(@CurrentUser() actor: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams, @ValidBody(sendBackRequestSchema) body: SendBackRequest) {
    return this.designs.sendBack(actor, params.slug, body);
  }

  @Get(':slug/versions')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Versions, newest first; readers see released and superseded ones only', response: methodVersionListSchema, tag })
  versions(@CurrentUser() user: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams) {
    return this.designs.versions(user, params.slug);
  }

  @Get(':slug/versions/:version')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'One released or superseded version, by number (404 for anything else)', response: methodRevisionSchema, tag })
  version(@ValidParams(methodVersionParamsSchema) params: MethodVersionParams) {
    return this.designs.version(params.slug, parseMethodVersion(params.version));
  }

  @Post(':slug/versions/:version/restore')
  @HttpCode(200)
  @Roles('admin')
  @ApiContract({ summary: "Start a new draft from an earlier version's definition (409 while a version is open)", response: methodRevisionSchema, tag })
  restore(@CurrentUser() actor: AuthUser, @ValidParams(methodVersionParamsSchema) params: MethodVersionParams) {
    return this.designs.restore(actor, params.slug, parseMethodVersion(params.version));
  }

  @Get(':slug/compare')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Compare two versions (or a version and the draft): inputs, formulas, checks, texts and test rows', response: methodCompareSchema, tag })
  compare(@CurrentUser() user: AuthUser, @ValidParams(methodDesignParamsSchema) params: MethodDesignParams, @ValidQuery(methodCompareQuerySchema) query: MethodCompareQuery) {
    return this.designs.compare(user, params.slug, query);
  }
}
