import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import {
  idParamSchema,
  laggingBlocksSchema,
  methodCatalogDetailSchema,
  moveBlocksForwardRequestSchema,
  moveBlocksForwardResponseSchema,
  type MoveBlocksForwardRequest,
} from '@limitbook/contracts';
import { z } from 'zod';
import { AnySignedIn, CurrentUser, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody, ValidParams } from '../../common/validation/valid.decorators.js';
import { editorRoles } from '../library/library-access.js';
import { MethodUsageService } from './method-usage.service.js';

const methodIdParamsSchema = z.strictObject({
  id: z.string().regex(/^(house:)?[a-z0-9][a-z0-9-]{0,99}$/, 'Method ids are lower-case letters, digits and hyphens (in-house ones start with house:)'),
});

@Controller()
export class MethodUsageController {
  constructor(private readonly usage: MethodUsageService) {}

  @Get('methods/:id/usage')
  @Roles(...AnySignedIn)
  @ApiContract({
    summary: 'Where a method is used (pages, revisions, blocks and pinned versions) and, for in-house methods, the released test table',
    response: methodCatalogDetailSchema,
    tag: 'Methods',
  })
  catalogDetail(@CurrentUser() user: AuthUser, @ValidParams(methodIdParamsSchema) params: { id: string }) {
    return this.usage.catalogDetail(user, params.id);
  }

  @Get('pages/:id/lagging-blocks')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: "Calculator blocks pinned to a method version older than the method's latest release", response: laggingBlocksSchema, tag: 'Methods' })
  lagging(@CurrentUser() user: AuthUser, @ValidParams(idParamSchema) params: { id: string }) {
    return this.usage.lagging(user, params.id);
  }

  @Post('pages/:id/lagging-blocks/move-forward')
  @HttpCode(200)
  @Roles(...editorRoles)
  @ApiContract({
    summary: "Pin the chosen blocks to their method's latest release in the page's draft (started from the released revision when there is none)",
    response: moveBlocksForwardResponseSchema,
    tag: 'Methods',
  })
  moveForward(@CurrentUser() actor: AuthUser, @ValidParams(idParamSchema) params: { id: string }, @ValidBody(moveBlocksForwardRequestSchema) body: MoveBlocksForwardRequest) {
    return this.usage.moveForward(actor, params.id, body);
  }
}
