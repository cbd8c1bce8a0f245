import { z } from 'zod';
import { errorBodySchema } from '../common/error.js';
import { acceptanceRuleSchema } from './acceptance.js';
import { lengthUnitSchema } from './length-unit.js';

export { lengthUnits, lengthUnitSchema, type LengthUnit } from './length-unit.js';

/** One line of a worked derivation: a label, a LaTeX formula with the numbers substituted, the value. */
export const derivationStepSchema = z.object({
  label: z.string(),
  latex: z.string(),
  value: z.string(),
});
export type DerivationStep = z.infer<typeof derivationStepSchema>;

export const verdictCheckSchema = z.object({ label: z.string(), pass: z.boolean(), detail: z.string() });
export type VerdictCheck = z.infer<typeof verdictCheckSchema>;

export const verdictSchema = z.object({
  pass: z.boolean(),
  summary: z.string(),
  checks: z.array(verdictCheckSchema),
});
export type Verdict = z.infer<typeof verdictSchema>;

export const evaluationResultSchema = z.object({
  method: z.string(),
  version: z.number().int(),
  unit: lengthUnitSchema,
  outputs: z.record(z.string(), z.unknown()),
  verdict: verdictSchema.optional(),
  warnings: z.array(z.string()),
  steps: z.array(derivationStepSchema),
});
export type EvaluationResult = z.infer<typeof evaluationResultSchema>;

const methodVersionSchema = z
  .number({ message: 'Method version is a whole number' })
  .int('Method version is a whole number')
  .min(1, 'Method versions start at 1')
  .nullable()
  .optional();

export const evaluateRequestSchema = z.strictObject({
  inputs: z.record(z.string(), z.unknown(), { message: 'Inputs must be an object' }),
  unit: lengthUnitSchema.default('mm'),
  /** A calculator block's acceptance rule, judged on the server beside the method's own checks. */
  acceptance: acceptanceRuleSchema.optional(),
  /** In-house methods: the released version to evaluate (a calculator block's pin); null or absent = the latest release. */
  methodVersion: methodVersionSchema,
});
export type EvaluateRequest = z.input<typeof evaluateRequestSchema>;

export const maxBatchItems = 50;

export const batchEvaluateRequestSchema = z.strictObject({
  items: z
    .array(
      z.strictObject({
        method: z.string({ message: 'Method id is required' }).min(1, 'Method id is required').max(100),
        inputs: z.record(z.string(), z.unknown(), { message: 'Inputs must be an object' }),
        unit: lengthUnitSchema.default('mm'),
        acceptance: acceptanceRuleSchema.optional(),
        methodVersion: methodVersionSchema,
      }),
      { message: 'Items must be a list' },
    )
    .min(1, 'Send at least one item')
    .max(maxBatchItems, `Send at most ${maxBatchItems} items per request`),
});
export type BatchEvaluateRequest = z.input<typeof batchEvaluateRequestSchema>;

export const batchEvaluateResponseSchema = z.object({
  results: z.array(
    z.discriminatedUnion('ok', [
      z.object({ ok: z.literal(true), result: evaluationResultSchema }),
      z.object({ ok: z.literal(false), error: errorBodySchema }),
    ]),
  ),
});
export type BatchEvaluateResponse = z.infer<typeof batchEvaluateResponseSchema>;

export const outputKinds = ['length', 'number', 'percent', 'text', 'boolean', 'table', 'series', 'object'] as const;
export const outputDescriptionSchema = z.object({
  name: z.string(),
  label: z.string(),
  kind: z.enum(outputKinds),
  description: z.string(),
});
export type OutputDescription = z.infer<typeof outputDescriptionSchema>;

export const methodSources = ['built-in', 'in-house'] as const;

export const methodSummarySchema = z.object({
  id: z.string(),
  /** Built-ins: the engine's version. In-house (`house:*`): the latest released version. */
  version: z.number().int(),
  /** Built into Limitbook, or designed by the team (ids `house:<slug>`); absent means built-in. */
  source: z.enum(methodSources).optional(),
  title: z.string(),
  description: z.string(),
  /** Published sources the method follows, for the catalog and the derivation footer. */
  references: z.array(z.string()),
  /** Shown beside every result of the method (safety and scope notes). */
  cautions: z.array(z.string()),
  inputSchema: z.record(z.string(), z.unknown()),
  outputs: z.array(outputDescriptionSchema),
});
export type MethodSummary = z.infer<typeof methodSummarySchema>;

export const methodCatalogSchema = z.object({ items: z.array(methodSummarySchema) });
export type MethodCatalog = z.infer<typeof methodCatalogSchema>;
