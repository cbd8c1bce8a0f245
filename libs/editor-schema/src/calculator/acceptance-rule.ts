import { z } from 'zod';
import { lengthUnitSchema } from '@limitbook/contracts';

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

const symbolOperators: Record<string, AcceptanceOperator> = {
  '>=': '>=',
  '≥': '>=',
  '<=': '<=',
  '≤': '<=',
  '>': '>',
  '<': '<',
  '==': '==',
  '=': '==',
};

const numberPattern = String.raw`[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?`;
const unitPattern = String.raw`(?:\s*(mm|in))?`;
const comparisonText = new RegExp(String.raw`^\s*([A-Za-z_][\w.]*)\s*(>=|<=|==|≥|≤|=|>|<)\s*(${numberPattern})${unitPattern}\s*$`);
const rangeText = new RegExp(
  String.raw`^\s*([A-Za-z_][\w.]*)\s+between\s+(${numberPattern})\s*(?:and|\.\.|to)\s*(${numberPattern})${unitPattern}\s*$`,
  'i',
);

export type ParseAcceptanceRuleResult = { ok: true; rule: AcceptanceRule } | { ok: false; message: string };

/**
 * Reads the written form of an acceptance rule: `minWall >= 1.5 mm`, `minClearance > 0`,
 * `endPlay between 0.05 and 0.25 mm` (`≥`, `≤` and `=` are accepted too).
 */
export function parseAcceptanceRule(text: string): ParseAcceptanceRuleResult {
  const range = rangeText.exec(text);
  const comparison = range ? null : comparisonText.exec(text);
  let candidate: unknown;
  if (range) {
    const [, output, low, high, unit] = range;
    candidate = { output, operator: 'between', value: Number(low), value2: Number(high), ...(unit ? { unit } : {}) };
  } else if (comparison) {
    const [, output, symbol = '', value, unit] = comparison;
    candidate = { output, operator: symbolOperators[symbol], value: Number(value), ...(unit ? { unit } : {}) };
  } else {
    return { ok: false, message: 'Write the rule as "output >= value unit" or "output between low and high unit"' };
  }
  const parsed = acceptanceRuleSchema.safeParse(candidate);
  if (!parsed.success) return { ok: false, message: parsed.error.issues[0]?.message ?? 'Invalid acceptance rule' };
  return { ok: true, rule: parsed.data };
}

/** The written form of an acceptance rule; `parseAcceptanceRule` reads it back unchanged. */
export function formatAcceptanceRule(rule: AcceptanceRule): string {
  const unit = rule.unit ? ` ${rule.unit}` : '';
  if (rule.operator === 'between') return `${rule.output} between ${rule.value} and ${rule.value2}${unit}`;
  return `${rule.output} ${rule.operator} ${rule.value}${unit}`;
}
