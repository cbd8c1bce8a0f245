import { Controller, Delete, Get, HttpCode, Patch, Post, Put } from '@nestjs/common';
import {
  createPageRequestSchema,
  idParamSchema,
  pageListQuerySchema,
  pageListSchema,
  pageRefParamsSchema,
  pageSchema,
  pageViewQuerySchema,
  saveDraftRequestSchema,
  tagListSchema,
  updatePageRequestSchema,
  type CreatePageRequest,
  type PageListQuery,
  type PageViewQuery,
  type SaveDraftRequest,
  type UpdatePageRequest,
} from '@limitbook/contracts';
import { AnySignedIn, CurrentUser, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody, ValidParams, ValidQuery } from '../../common/validation/valid.decorators.js';
import { editorRoles } from './library-access.js';
import { PagesService } from './pages.service.js';

@Controller('pages')
export class PagesController {
  constructor(private readonly pages: PagesService) {}

  @Get()
  @Roles(...AnySignedIn)
  @ApiContract({
    summary: 'List pages, filtered by collection key and tag; readers see released pages only; obsolete pages only with `includeObsolete=true`',
    response: pageListSchema,
    tag: 'Library',
  })
  list(@CurrentUser() user: AuthUser, @ValidQuery(pageListQuerySchema) query: PageListQuery) {
    return this.pages.list(user, query);
  }

  @Post()
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Create a page with its first draft', response: pageSchema, tag: 'Library' })
  create(@CurrentUser() actor: AuthUser, @ValidBody(createPageRequestSchema) body: CreatePageRequest) {
    return this.pages.create(actor, body);
  }

  @Get(':ref')
  @Roles(...AnySignedIn)
  @ApiContract({
    summary: 'One page by id or document number: the latest released revision, or with `view=draft` the open revision (a draft for authors and admins, one in review for reviewers too)',
    response: pageSchema,
    tag: 'Library',
  })
  get(@CurrentUser() user: AuthUser, @ValidParams(pageRefParamsSchema) params: { ref: string }, @ValidQuery(pageViewQuerySchema) query: PageViewQuery) {
    return this.pages.get(user, params.ref, query.view);
  }

  @Patch(':id')
  @Roles(...editorRoles)
  @ApiContract({ summary: "Change a page's collection, tags or owner", response: pageSchema, tag: 'Library' })
  update(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(updatePageRequestSchema) body: UpdatePageRequest) {
    return this.pages.update(actor, params.id, body);
  }

  @Post(':id/draft')
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Start a draft of the next revision as a copy of the released one', response: pageSchema, tag: 'Library' })
  startDraft(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    return this.pages.startDraft(actor, params.id);
  }

  @Put(':id/draft')
  @Roles(...editorRoles)
  @ApiContract({
    summary: 'Save the draft; refused with 409 (and the current version) when `baseVersion` is not the latest',
    description: 'The body is checked node by node against the editor schema; problems come back as `fields` keyed like `document.content.3.attrs.href`.',
    response: pageSchema,
    tag: 'Library',
  })
  saveDraft(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(saveDraftRequestSchema) body: SaveDraftRequest) {
    return this.pages.saveDraft(actor, params.id, body);
  }

  @Delete(':id/draft')
  @HttpCode(204)
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Discard the draft (a page never released goes with it)', status: 204, tag: 'Library' })
  async deleteDraft(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    await this.pages.deleteDraft(actor, params.id);
  }
}

@Controller('tags')
export class TagsController {
  constructor(private readonly pages: PagesService) {}

  @Get()
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Tags in use, with how many pages the caller can see carry each', response: tagListSchema, tag: 'Library' })
  list(@CurrentUser() user: AuthUser) {
    return this.pages.tags(user);
  }
}
