import { z } from 'zod';
import { errorBodySchema } from '../common/error.js';
import { personRefSchema, revisionReviewSchema, revisionStateSchema } from '../library/pages.js';
import { evaluationResultSchema } from '../methods/evaluation.js';
import { formulaLimits, formulaNamePattern } from '../methods/formula.js';

/**
 * In-house methods designed by the team: named inputs with units, formulas (intermediates and
 * outputs) in the formula sandbox's syntax, checks that make the verdict, and a test table that
 * must pass before a version can be released. Ids are `house:<slug>`.
 *
 * Routes (under /api; `:slug` is the part after `house:`):
 * - GET    method-designs                               → MethodDesignList (readers: released ones only)
 * - POST   method-designs                {slug, definition} → MethodDesign (authors, admins; 409 slug taken)
 * - GET    method-designs/:slug                         → MethodDesign
 * - POST   method-designs/:slug/draft                   → MethodRevision (new draft from the latest release; 409 if one is open)
 * - GET    method-designs/:slug/draft                   → MethodRevision (draft or in review; 404 none)
 * - PUT    method-designs/:slug/draft    {baseVersion, definition} → MethodRevision (409 stale; 400 refused formulas)
 * - DELETE method-designs/:slug/draft                   → {deleted: true} (the design too when never released)
 * - POST   method-designs/preview        {definition, values} → MethodPreviewResponse | 400 MethodDesignError
 * - POST   method-designs/:slug/draft/run-tests         → TestRun | 400 MethodDesignError
 * - POST   method-designs/:slug/draft/submit {reviewerIds, note?} → MethodRevision (400 `tests.<i>` per failing row)
 * - POST   method-designs/:slug/draft/withdraw          → MethodRevision
 * - POST   method-designs/:slug/draft/approve {baseVersion, comment?} → MethodRevision (released; 403 own)
 * - POST   method-designs/:slug/draft/send-back {comment} → MethodRevision
 * - GET    method-designs/:slug/versions                → MethodVersionList
 * - GET    method-designs/:slug/versions/:version       → MethodRevision (one released or superseded version)
 * - GET    method-designs/:slug/compare?from=1&to=2|draft → MethodCompare
 * - POST   method-designs/:slug/versions/:version/restore → MethodRevision (admins; new draft from that version)
 * - GET    methods/:id/usage                            → MethodCatalogDetail (built-in or house:*)
 * - GET    pages/:id/lagging-blocks                     → LaggingBlocks
 * - POST   pages/:id/lagging-blocks/move-forward {blockIds, baseVersion?} → MoveBlocksForwardResponse
 * GET /api/methods lists released in-house methods beside the built-ins (`source: 'in-house'`);
 * POST /api/methods/:id/evaluate and /api/evaluate items take `methodVersion`.
 */

export const houseMethodPrefix = 'house:';

/** The part of `house:<slug>` the author picks: lower-case letters, digits and single hyphens. */
export const methodDesignSlugSchema = z
  .string({ message: 'Give the method a short id such as o-ring-squeeze' })
  .trim()
  .min(3, 'The id is at least 3 characters')
  .max(60, 'The id is at most 60 characters')
  .regex(/^[a-z][a-z0-9]*(-[a-z0-9]+)*$/, 'Use lower-case letters, digits and single hyphens, starting with a letter (o-ring-squeeze)');

/** `house:<slug>`, the method id calculator blocks and records use. */
export const houseMethodIdSchema = z.string().regex(/^house:[a-z][a-z0-9]*(-[a-z0-9]+)*$/, 'An in-house method id looks like house:o-ring-squeeze');

export function isHouseMethodId(id: string): boolean {
  return id.startsWith(houseMethodPrefix);
}

/**
 * What an input measures. Each kind maps to a base unit, and an input's unit must convert to
 * it (`mm` for length, `MPa` or `bar` for pressure…). Stress and modulus share pressure's
 * dimension but are kept apart for the reader.
 */
export const quantityKinds = ['length', 'area', 'angle', 'force', 'pressure', 'stress', 'torque', 'mass', 'temperature', 'dimensionless'] as const;
export const quantityKindSchema = z.enum(quantityKinds, { message: `Kind must be one of ${quantityKinds.join(', ')}` });
export type QuantityKind = z.infer<typeof quantityKindSchema>;

/** mathjs unit text each kind converts to; dimensionless takes no unit. */
export const quantityKindBaseUnits: Record<QuantityKind, string | null> = {
  length: 'm',
  area: 'm^2',
  angle: 'rad',
  force: 'N',
  pressure: 'Pa',
  stress: 'Pa',
  torque: 'N m',
  mass: 'kg',
  temperature: 'K',
  dimensionless: null,
};

export const designLimits = {
  maxInputs: 40,
  maxIntermediates: 60,
  maxOutputs: 30,
  maxChecks: 30,
  maxTexts: 20,
  maxTestRows: 50,
  maxDecimals: 10,
} as const;

const nameSchema = z
  .string({ message: 'Name is required' })
  .trim()
  .min(1, 'Name is required')
  .max(formulaLimits.maxNameLength, `A name is at most ${formulaLimits.maxNameLength} characters`)
  .regex(formulaNamePattern, 'A name starts with a letter, then letters, digits or _ (d_cord)');

const labelSchema = z.string({ message: 'Label is required' }).trim().min(1, 'Label is required').max(120, 'A label is at most 120 characters');

const expressionSchema = z
  .string({ message: 'Expression is required' })
  .trim()
  .min(1, 'Expression is required')
  .max(formulaLimits.maxExpressionLength, `An expression is at most ${formulaLimits.maxExpressionLength} characters`);

/** mathjs unit text such as mm, MPa, N m or deg; empty for plain numbers. */
const unitTextSchema = z
  .string({ message: 'Unit is text such as mm or MPa' })
  .trim()
  .max(40, 'A unit is at most 40 characters')
  .regex(/^[A-Za-z0-9 ^*/()._-]*$/, 'A unit is written like mm, MPa, N m or N/mm^2');

const finite = (label: string) => z.number({ message: `${label} must be a number` }).finite(`${label} must be finite`);

export const designInputSchema = z
  .strictObject({
    name: nameSchema,
    label: labelSchema,
    kind: quantityKindSchema,
    /** In this unit the default, the range and every value given for the input are read. */
    unit: unitTextSchema.default(''),
    default: finite('Default').nullable().default(null),
    min: finite('Minimum').nullable().default(null),
    max: finite('Maximum').nullable().default(null),
    help: z.string().trim().max(1000, 'Help is at most 1000 characters').default(''),
  })
  .superRefine((input, context) => {
    if (input.min !== null && input.max !== null && input.min > input.max) context.addIssue({ code: 'custom', path: ['max'], message: 'Maximum is below the minimum' });
    if (input.default !== null) {
      if (input.min !== null && input.default < input.min) context.addIssue({ code: 'custom', path: ['default'], message: 'Default is below the minimum' });
      if (input.max !== null && input.default > input.max) context.addIssue({ code: 'custom', path: ['default'], message: 'Default is above the maximum' });
    }
    if (input.kind !== 'dimensionless' && input.unit === '') context.addIssue({ code: 'custom', path: ['unit'], message: `Give the unit the ${input.kind} is entered in` });
  });
export type DesignInput = z.output<typeof designInputSchema>;

/** An intermediate or an output: `name = expression`, shown in `unit` with `decimals`. */
export const designFormulaSchema = z.strictObject({
  name: nameSchema,
  label: labelSchema,
  expression: expressionSchema,
  /** Display unit; the result is converted into it and must have the same dimension. Empty: as computed (plain numbers). */
  unit: unitTextSchema.default(''),
  decimals: z.number({ message: 'Decimals must be a number' }).int('Decimals is a whole number').min(0, 'Decimals is 0 or more').max(designLimits.maxDecimals, `At most ${designLimits.maxDecimals} decimals`).default(3),
});
export type DesignFormula = z.output<typeof designFormulaSchema>;

export const designCheckSchema = z.strictObject({
  /** A comparison that must come out true, such as `squeezeMin >= 10`. */
  expression: expressionSchema,
  message: z.string({ message: 'Say what the check asks' }).trim().min(1, 'Say what the check asks').max(300, 'A message is at most 300 characters'),
});
export type DesignCheck = z.output<typeof designCheckSchema>;

export const testExpectationSchema = z.strictObject({
  /** In the output's display unit. */
  value: finite('Expected value'),
  /** Allowed difference, same unit; 0 means as displayed with the output's decimals. */
  tolerance: finite('Tolerance').min(0, 'Tolerance is 0 or more').default(0),
});
export type TestExpectation = z.output<typeof testExpectationSchema>;

export const designTestRowSchema = z.strictObject({
  label: z.string().trim().max(200, 'A row label is at most 200 characters').default(''),
  /** Input values by input name, in each input's unit; absent inputs take their default. */
  inputs: z.record(z.string(), finite('Input value'), { message: 'Inputs are name → number' }),
  /** Expected outputs by output name. */
  expected: z.record(z.string(), testExpectationSchema, { message: 'Expected values are output name → { value, tolerance }' }),
  expectedVerdict: z.enum(['pass', 'fail'], { message: 'Expected verdict is pass or fail' }).nullable().default(null),
});
export type DesignTestRow = z.output<typeof designTestRowSchema>;

const textListSchema = (label: string) =>
  z
    .array(z.string().trim().min(1, `${label} cannot be empty`).max(2000, `${label} is at most 2000 characters`), { message: `${label}s must be a list` })
    .max(designLimits.maxTexts, `At most ${designLimits.maxTexts} ${label.toLowerCase()}s`)
    .default([]);

/** Everything one revision of an in-house method holds. */
export const designDefinitionSchema = z.strictObject({
  name: z.string({ message: 'Name is required' }).trim().min(1, 'Name is required').max(200, 'A name is at most 200 characters'),
  description: z.string().trim().max(4000, 'The description is at most 4000 characters').default(''),
  inputs: z.array(designInputSchema, { message: 'Inputs must be a list' }).max(designLimits.maxInputs, `At most ${designLimits.maxInputs} inputs`).default([]),
  intermediates: z
    .array(designFormulaSchema, { message: 'Intermediates must be a list' })
    .max(designLimits.maxIntermediates, `At most ${designLimits.maxIntermediates} intermediates`)
    .default([]),
  outputs: z.array(designFormulaSchema, { message: 'Outputs must be a list' }).max(designLimits.maxOutputs, `At most ${designLimits.maxOutputs} outputs`).default([]),
  checks: z.array(designCheckSchema, { message: 'Checks must be a list' }).max(designLimits.maxChecks, `At most ${designLimits.maxChecks} checks`).default([]),
  references: textListSchema('Reference'),
  cautions: textListSchema('Caution'),
  /** Adds the standard safety caution to every result (pressure, strength, safety-critical fits). */
  safetyCritical: z.boolean({ message: 'Safety flag is true or false' }).default(false),
  tests: z.array(designTestRowSchema, { message: 'Tests must be a list' }).max(designLimits.maxTestRows, `At most ${designLimits.maxTestRows} test rows`).default([]),
});
export type DesignDefinition = z.output<typeof designDefinitionSchema>;
export type DesignDefinitionInput = z.input<typeof designDefinitionSchema>;

/** The caution every safety-flagged in-house method carries. */
export const safetyCaution =
  'Safety: this in-house method supports design work only. It is not a strength, pressure or safety sign-off; the applicable codes and a qualified engineer decide.';

/** Values for an evaluation: numbers in each input's unit, or quantities with their own unit ("2.8 mm"). */
export const designValuesSchema = z.record(
  z.string(),
  z.union([z.number().finite('Value must be finite'), z.string().trim().min(1, 'Value is empty').max(100, 'Value is at most 100 characters')], {
    message: 'A value is a number (in the input unit) or a quantity such as "2.8 mm"',
  }),
  { message: 'Values are input name → value' },
);

// ---- Requests ----

export const createMethodDesignRequestSchema = z.strictObject({
  slug: methodDesignSlugSchema,
  /** The first draft; a name is enough to start. */
  definition: designDefinitionSchema,
});
export type CreateMethodDesignRequest = z.input<typeof createMethodDesignRequestSchema>;

export const saveMethodDraftRequestSchema = z.strictObject({
  baseVersion: z.number({ message: 'Base version is required' }).int('Base version is a whole number').min(1, 'Base version starts at 1'),
  definition: designDefinitionSchema,
});
export type SaveMethodDraftRequest = z.input<typeof saveMethodDraftRequestSchema>;

export const methodPreviewRequestSchema = z.strictObject({
  definition: designDefinitionSchema,
  /** Absent inputs take their default. */
  values: designValuesSchema.default({}),
});
export type MethodPreviewRequest = z.input<typeof methodPreviewRequestSchema>;

export const methodDesignParamsSchema = z.strictObject({ slug: methodDesignSlugSchema });
export type MethodDesignParams = z.infer<typeof methodDesignParamsSchema>;

/** A released version number, or `draft` for the open revision. */
const versionOrDraftSchema = z.union([z.literal('draft'), z.coerce.number().int().min(1)], { message: 'A version number or draft' });
/**
 * `version` is a released version number in the path; anything that is not one (`abc`, `0`)
 * names no version and is answered with 404, like a number that was never released.
 */
export const methodVersionParamsSchema = z.strictObject({
  slug: methodDesignSlugSchema,
  version: z.string().max(20, 'No such version'),
});
export type MethodVersionParams = z.infer<typeof methodVersionParamsSchema>;

/** The version number a path segment names, or null when it names none. */
export function parseMethodVersion(segment: string): number | null {
  return /^[1-9]\d{0,8}$/.test(segment) ? Number(segment) : null;
}

export const methodCompareQuerySchema = z.strictObject({ from: versionOrDraftSchema, to: versionOrDraftSchema });
export type MethodCompareQuery = z.infer<typeof methodCompareQuerySchema>;

// ---- Responses ----

/** Messages per field of the definition (`outputs.1.expression`, `inputs.0.unit`, `tests.2`). */
export const definitionProblemsSchema = z.record(z.string(), z.string());

/** LaTeX of each expression by field (`intermediates.0.expression`, `checks.1.expression`); absent where it does not parse. */
export const expressionTexSchema = z.record(z.string(), z.string());

export const methodRevisionSchema = z.object({
  id: z.string(),
  methodId: z.string(),
  state: revisionStateSchema,
  /** The released version number (1, 2, 3…); null while draft or in review. */
  methodVersion: z.number().int().nullable(),
  /** Edit counter of the open revision; send it as `baseVersion` when saving or approving. */
  version: z.number().int(),
  definition: designDefinitionSchema,
  createdAt: z.string(),
  createdBy: personRefSchema.nullable(),
  updatedAt: z.string(),
  updatedBy: personRefSchema.nullable(),
  releasedAt: z.string().nullable(),
  approvedBy: personRefSchema.nullable(),
  supersededAt: z.string().nullable(),
  review: revisionReviewSchema,
  /** Version this draft was restored from by an admin. */
  restoredFromVersion: z.number().int().nullable(),
  /** Open revisions: what keeps it from being submitted (formula problems); empty when none. */
  problems: definitionProblemsSchema,
  tex: expressionTexSchema,
});
export type MethodRevision = z.infer<typeof methodRevisionSchema>;

export const methodDesignSummarySchema = z.object({
  id: z.string(),
  slug: z.string(),
  /** Name of the latest released version, or of the draft before the first release. */
  name: z.string(),
  description: z.string(),
  owner: personRefSchema.nullable(),
  latestVersion: z.number().int().nullable(),
  releasedAt: z.string().nullable(),
  /** The open revision, for authors, admins and reviewers (in review); null otherwise. */
  draft: z.object({ state: revisionStateSchema, version: z.number().int(), updatedAt: z.string() }).nullable(),
  safetyCritical: z.boolean(),
  createdAt: z.string(),
});
export type MethodDesignSummary = z.infer<typeof methodDesignSummarySchema>;

export const methodDesignListSchema = z.object({ items: z.array(methodDesignSummarySchema) });
export type MethodDesignList = z.infer<typeof methodDesignListSchema>;

export const methodDesignSchema = methodDesignSummarySchema.extend({
  /** The latest released revision, null before the first release. */
  released: methodRevisionSchema.nullable(),
});
export type MethodDesign = z.infer<typeof methodDesignSchema>;

export const methodVersionEntrySchema = methodRevisionSchema.pick({
  id: true,
  state: true,
  methodVersion: true,
  version: true,
  createdAt: true,
  createdBy: true,
  updatedAt: true,
  releasedAt: true,
  approvedBy: true,
  supersededAt: true,
  review: true,
  restoredFromVersion: true,
});
/** Newest first; readers see released and superseded versions only. */
export const methodVersionListSchema = z.object({ items: z.array(methodVersionEntrySchema.extend({ name: z.string() })) });
export type MethodVersionList = z.infer<typeof methodVersionListSchema>;

export const methodPreviewResponseSchema = z.object({
  result: evaluationResultSchema,
  tex: expressionTexSchema,
});
export type MethodPreviewResponse = z.infer<typeof methodPreviewResponseSchema>;

/** The 400 of preview, save and run-tests: the usual error body plus the TeX of what did parse. */
export const methodDesignErrorSchema = errorBodySchema.extend({ tex: expressionTexSchema.optional() });
export type MethodDesignError = z.infer<typeof methodDesignErrorSchema>;

export const testOutputCheckSchema = z.object({
  output: z.string(),
  expected: z.number(),
  tolerance: z.number(),
  /** Null when the output could not be computed. */
  actual: z.number().nullable(),
  difference: z.number().nullable(),
  unit: z.string(),
  pass: z.boolean(),
});

export const testRowResultSchema = z.object({
  index: z.number().int(),
  label: z.string(),
  pass: z.boolean(),
  outputs: z.array(testOutputCheckSchema),
  expectedVerdict: z.enum(['pass', 'fail']).nullable(),
  verdict: z.enum(['pass', 'fail']).nullable(),
  /** Field messages when the row could not be evaluated (`values.depth`, `outputs.0.expression`). */
  errors: z.record(z.string(), z.string()),
});
export type TestRowResult = z.infer<typeof testRowResultSchema>;

export const testRunSchema = z.object({
  pass: z.boolean(),
  passed: z.number().int(),
  failed: z.number().int(),
  rows: z.array(testRowResultSchema),
});
export type TestRun = z.infer<typeof testRunSchema>;

export const changeKinds = ['added', 'removed', 'changed'] as const;

/** One changed entry of a list (inputs, intermediates, outputs, checks, test rows), matched by name or position. */
export const definitionChangeSchema = z.object({
  section: z.enum(['general', 'inputs', 'intermediates', 'outputs', 'checks', 'references', 'cautions', 'tests']),
  /** Input/formula name, `#<n>` for checks, texts and test rows (1-based), or the setting for general. */
  key: z.string(),
  change: z.enum(changeKinds),
  /** The settings that differ, each before and after (null where absent). */
  rows: z.array(z.object({ field: z.string(), from: z.string().nullable(), to: z.string().nullable() })),
  /** For expressions and long texts: word by word, from the `diff` package. */
  text: z.array(z.object({ kind: z.enum(['added', 'removed', 'unchanged']), text: z.string() })).nullable(),
});
export type DefinitionChange = z.infer<typeof definitionChangeSchema>;

export const methodVersionRefSchema = z.object({ id: z.string(), state: revisionStateSchema, methodVersion: z.number().int().nullable() });

export const methodCompareSchema = z.object({
  from: methodVersionRefSchema,
  to: methodVersionRefSchema,
  changes: z.array(definitionChangeSchema),
});
export type MethodCompare = z.infer<typeof methodCompareSchema>;

// ---- Catalog detail and lagging blocks ----

export const methodUsageSchema = z.object({
  pageId: z.string(),
  documentNumber: z.string(),
  title: z.string(),
  revisionId: z.string(),
  state: revisionStateSchema,
  revisionLetter: z.string().nullable(),
  blockId: z.string(),
  caption: z.string(),
  /** Pinned version; null follows the latest release. */
  methodVersion: z.number().int().nullable(),
});
export type MethodUsage = z.infer<typeof methodUsageSchema>;

export const methodCatalogDetailSchema = z.object({
  id: z.string(),
  source: z.enum(['built-in', 'in-house']),
  /** The latest released version (built-ins: the engine's version). */
  latestVersion: z.number().int(),
  /** Calculator blocks in released revisions and open drafts that use the method (drafts only for editors). */
  usages: z.array(methodUsageSchema),
  /** In-house: the test table of the latest released version; empty for built-ins. */
  tests: z.array(designTestRowSchema),
});
export type MethodCatalogDetail = z.infer<typeof methodCatalogDetailSchema>;

export const laggingBlockSchema = z.object({
  blockId: z.string(),
  caption: z.string(),
  method: z.string(),
  pinnedVersion: z.number().int(),
  latestVersion: z.number().int(),
});
export type LaggingBlock = z.infer<typeof laggingBlockSchema>;

export const laggingBlocksSchema = z.object({
  pageId: z.string(),
  /** Which revision was read: the open draft for editors when there is one, else the released revision. */
  revisionId: z.string(),
  state: revisionStateSchema,
  items: z.array(laggingBlockSchema),
});
export type LaggingBlocks = z.infer<typeof laggingBlocksSchema>;

export const moveBlocksForwardRequestSchema = z.strictObject({
  blockIds: z.array(z.uuid({ message: 'Must be a valid id' }), { message: 'Pick the blocks to move' }).min(1, 'Pick at least one block').max(200),
  /** The draft's version when a draft is open (409 when stale); leave out to start the draft from the released revision. */
  baseVersion: z.number().int().min(1).optional(),
});
export type MoveBlocksForwardRequest = z.infer<typeof moveBlocksForwardRequestSchema>;

export const moveBlocksForwardResponseSchema = z.object({
  pageId: z.string(),
  /** The page's draft after the change. */
  revisionId: z.string(),
  version: z.number().int(),
  moved: z.array(z.object({ blockId: z.string(), from: z.number().int(), to: z.number().int() })),
});
export type MoveBlocksForwardResponse = z.infer<typeof moveBlocksForwardResponseSchema>;

