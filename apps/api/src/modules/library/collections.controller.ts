import { Controller, Delete, Get, HttpCode, Patch, Post } from '@nestjs/common';
import {
  collectionListSchema,
  collectionSchema,
  createCollectionRequestSchema,
  idParamSchema,
  updateCollectionRequestSchema,
  type CreateCollectionRequest,
  type UpdateCollectionRequest,
} from '@limitbook/contracts';
import { AnySignedIn, CurrentUser, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody, ValidParams } from '../../common/validation/valid.decorators.js';
import { CollectionsService } from './collections.service.js';
import { editorRoles } from './library-access.js';

@Controller('collections')
export class CollectionsController {
  constructor(private readonly collections: CollectionsService) {}

  @Get()
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Collections of the library, with how many pages each holds for the caller', response: collectionListSchema, tag: 'Library' })
  list(@CurrentUser() user: AuthUser) {
    return this.collections.list(user);
  }

  @Post()
  @Roles(...editorRoles)
  @ApiContract({ summary: 'Create a collection', response: collectionSchema, tag: 'Library' })
  create(@CurrentUser() actor: AuthUser, @ValidBody(createCollectionRequestSchema) body: CreateCollectionRequest) {
    return this.collections.create(actor, body);
  }

  @Patch(':id')
  @Roles(...editorRoles)
  @ApiContract({ summary: "Rename a collection or change its description (its key stays)", response: collectionSchema, tag: 'Library' })
  update(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(updateCollectionRequestSchema) body: UpdateCollectionRequest) {
    return this.collections.update(actor, params.id, body);
  }

  @Delete(':id')
  @HttpCode(204)
  @Roles('admin')
  @ApiContract({ summary: 'Delete an empty collection', status: 204, tag: 'Library' })
  async delete(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    await this.collections.delete(actor, params.id);
  }
}
