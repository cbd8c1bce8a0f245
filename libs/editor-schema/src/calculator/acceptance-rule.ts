import { acceptanceRuleSchema, type AcceptanceOperator, type AcceptanceRule } from '@limitbook/contracts';

export { acceptanceOperators, acceptanceRuleSchema, outputPathSchema, type AcceptanceOperator, type AcceptanceRule } from '@limitbook/contracts';

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
