import { z } from 'zod';

/** Limits of one formula set; the sandbox refuses anything beyond them. */
export const formulaLimits = {
  maxExpressions: 100,
  maxChecks: 50,
  maxValues: 100,
  maxExpressionLength: 500,
  maxNameLength: 64,
} as const;

export const formulaNamePattern = /^[A-Za-z][A-Za-z0-9_]*$/;

const expressionText = z
  .string({ message: 'Expression must be text' })
  .max(formulaLimits.maxExpressionLength, `Expression is longer than ${formulaLimits.maxExpressionLength} characters`);

export const formulaCheckSchema = z.union(
  [
    expressionText,
    z.strictObject({
      expression: expressionText,
      message: z.string({ message: 'Message must be text' }).max(200, 'Message is at most 200 characters').optional(),
    }),
  ],
  { message: 'A check is an expression, or { expression, message }' },
);
export type FormulaCheck = z.output<typeof formulaCheckSchema>;

export const formulaValueSchema = z.union(
  [
    z.number().finite('Value must be finite'),
    z.string().trim().min(1, 'Value is empty').max(100, 'Value is at most 100 characters'),
  ],
  { message: 'A value is a number or a quantity such as "12 mm"' },
);

export const formulaInputSchema = z.strictObject({
  expressions: z
    .array(expressionText, { message: 'Expressions must be a list' })
    .min(1, 'Add at least one expression')
    .max(formulaLimits.maxExpressions, `At most ${formulaLimits.maxExpressions} expressions`)
    .describe('Each "name = expression" (mathjs syntax, units allowed) defines a named result, in order.'),
  values: z
    .record(z.string(), formulaValueSchema, { message: 'Values must be an object of name → value' })
    .default({})
    .refine((values) => Object.keys(values).length <= formulaLimits.maxValues, `At most ${formulaLimits.maxValues} values`)
    .describe('Input quantities by name: a number or a quantity with a unit such as "12 mm" or "210 GPa".'),
  checks: z
    .array(formulaCheckSchema, { message: 'Checks must be a list' })
    .max(formulaLimits.maxChecks, `At most ${formulaLimits.maxChecks} checks`)
    .default([])
    .describe('Comparisons that must hold, as "expression" or { expression, message }; they make the verdict.'),
});
export type FormulaInputs = z.output<typeof formulaInputSchema>;
