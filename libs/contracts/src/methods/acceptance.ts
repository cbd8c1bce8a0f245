import { z } from 'zod';
import { lengthUnitSchema } from './length-unit.js';

export const acceptanceOperators = ['>=', '<=', '>', '<', '==', 'between'] as const;
export type AcceptanceOperator = (typeof acceptanceOperators)[number];

/** Dotted path of a method output, e.g. `minWall` or `fit.minClearance`. */
export const outputPathSchema = z
  .string()
  .max(200, 'Output path is too long')
  .regex(/^[A-Za-z_][A-Za-z0-9_]*(\.[A-Za-z_][A-Za-z0-9_]*)*$/, 'Output must be a name such as minWall');

/**
 * A calculator block's acceptance rule: one output compared with a limit, or with a closed
 * range for `between`. `unit` is the unit the limits are written in; without it they are
 * in the block's unit.
 */
export const acceptanceRuleSchema = z
  .strictObject({
    output: outputPathSchema,
    operator: z.enum(acceptanceOperators, { message: `Operator must be one of ${acceptanceOperators.join(', ')}` }),
    value: z.number().finite(),
    value2: z.number().finite().optional(),
    unit: lengthUnitSchema.optional(),
  })
  .superRefine((rule, context) => {
    if (rule.operator === 'between') {
      if (rule.value2 === undefined) context.addIssue({ code: 'custom', path: ['value2'], message: 'A range needs an upper limit' });
      else if (rule.value2 < rule.value) context.addIssue({ code: 'custom', path: ['value2'], message: 'The upper limit is below the lower limit' });
    } else if (rule.value2 !== undefined) {
      context.addIssue({ code: 'custom', path: ['value2'], message: 'Only a range has a second limit' });
    }
  });
export type AcceptanceRule = z.infer<typeof acceptanceRuleSchema>;
