import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import {
  batchEvaluateRequestSchema,
  batchEvaluateResponseSchema,
  evaluateRequestSchema,
  evaluationResultSchema,
  methodCatalogSchema,
  methodSummarySchema,
  type AcceptanceRule,
  type LengthUnit,
} from '@limitbook/contracts';
import { z } from 'zod';
import { AnySignedIn, Roles } from '../../common/auth/access.decorators.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidBody, ValidParams } from '../../common/validation/valid.decorators.js';
import { MethodsService } from './methods.service.js';

const methodIdParamsSchema = z.strictObject({
  id: z.string().regex(/^(house:)?[a-z0-9][a-z0-9-]{0,99}$/, 'Method ids are lower-case letters, digits and hyphens (in-house ones start with house:)'),
});

@Controller()
@Roles(...AnySignedIn)
export class MethodsController {
  constructor(private readonly methods: MethodsService) {}

  @Get('methods')
  @ApiContract({ summary: 'Catalog of methods with their versions, input JSON schemas and outputs', response: methodCatalogSchema, tag: 'Methods' })
  async list() {
    return { items: await this.methods.listMethods() };
  }

  @Get('methods/:id')
  @ApiContract({ summary: 'One method of the catalog', response: methodSummarySchema, tag: 'Methods' })
  get(@ValidParams(methodIdParamsSchema) params: { id: string }) {
    return this.methods.getMethod(params.id);
  }

  @Post('methods/:id/evaluate')
  @HttpCode(200)
  @ApiContract({
    summary: 'Evaluate one method; lengths in and out are in `unit` (mm by default)',
    response: evaluationResultSchema,
    tag: 'Methods',
  })
  evaluate(
    @ValidParams(methodIdParamsSchema) params: { id: string },
    @ValidBody(evaluateRequestSchema) body: { inputs: Record<string, unknown>; unit: LengthUnit; acceptance?: AcceptanceRule; methodVersion?: number | null },
  ) {
    return this.methods.evaluate({ method: params.id, ...body });
  }

  @Post('evaluate')
  @HttpCode(200)
  @ApiContract({
    summary: 'Evaluate several methods in one round trip; each item succeeds or fails on its own',
    response: batchEvaluateResponseSchema,
    tag: 'Methods',
  })
  evaluateBatch(
    @ValidBody(batchEvaluateRequestSchema)
    body: { items: { method: string; inputs: Record<string, unknown>; unit: LengthUnit; acceptance?: AcceptanceRule; methodVersion?: number | null }[] },
  ) {
    return this.methods.evaluateBatch(body.items);
  }
}
