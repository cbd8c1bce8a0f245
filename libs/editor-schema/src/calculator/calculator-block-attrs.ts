import { z } from 'zod';
import { lengthUnitSchema, uuidSchema } from '@limitbook/contracts';
import { acceptanceRuleSchema } from './acceptance-rule.js';

export const maxCaptionLength = 500;
export const maxLockedInputs = 200;

const jsonValueSchema: z.ZodType<unknown> = z.lazy(() =>
  z.union([
    z.string().max(10_000),
    z.number().finite(),
    z.boolean(),
    z.null(),
    z.array(jsonValueSchema).max(1_000),
    z.record(z.string().max(200), jsonValueSchema),
  ]),
);

const inputNamePattern = /^[A-Za-z_][A-Za-z0-9_]*$/;

/** Dotted path of a method input; array items by index, e.g. `contributors.2.tolerance`. */
export const inputPathSchema = z
  .string()
  .max(200, 'Input path is too long')
  .regex(/^[A-Za-z_][A-Za-z0-9_]*(\.(\d+|[A-Za-z_][A-Za-z0-9_]*))*$/, 'Input path must look like bore.diameter or contributors.0.tolerance');

export const methodIdSchema = z
  .string({ message: 'Method id is required' })
  .min(1, { message: 'Method id is required', abort: true })
  .max(100, 'Method id is too long')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._:/-]*$/, 'Method id may hold letters, digits and . _ : / - only');

export const calculatorDefaultsSchema = z.record(
  z.string().regex(inputNamePattern, 'Input names are letters, digits and _'),
  jsonValueSchema,
);

function valueAtPath(root: unknown, path: string): unknown {
  let current: unknown = root;
  for (const key of path.split('.')) {
    if (current === null || typeof current !== 'object' || !Object.hasOwn(current, key)) return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  return current;
}

/**
 * Attributes of a calculator block as stored in a page. `blockId` stays the same across
 * revisions so records can cite the block; `methodVersion: null` follows the method's
 * released version; `locked` inputs are shown to readers but cannot be changed, so each
 * must have a default.
 */
export const calculatorBlockAttrsSchema = z
  .strictObject({
    blockId: uuidSchema,
    method: methodIdSchema,
    methodVersion: z.number().int().positive().nullable().default(null),
    unit: lengthUnitSchema.default('mm'),
    defaults: calculatorDefaultsSchema.default({}),
    locked: z
      .array(inputPathSchema, { message: 'Locked inputs must be a list of input paths' })
      .max(maxLockedInputs)
      .default([]),
    acceptance: acceptanceRuleSchema.nullable().default(null),
    caption: z.string().max(maxCaptionLength, `Caption must be at most ${maxCaptionLength} characters`).default(''),
  })
  .superRefine((attrs, context) => {
    const seen = new Set<string>();
    attrs.locked.forEach((path, index) => {
      if (seen.has(path)) context.addIssue({ code: 'custom', path: ['locked', index], message: `Input ${path} is locked twice` });
      else if (valueAtPath(attrs.defaults, path) === undefined)
        context.addIssue({ code: 'custom', path: ['locked', index], message: `Locked input ${path} has no default value` });
      seen.add(path);
    });
  });
export type CalculatorBlockAttrs = z.output<typeof calculatorBlockAttrsSchema>;
export type CalculatorBlockAttrsInput = z.input<typeof calculatorBlockAttrsSchema>;
