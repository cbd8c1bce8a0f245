import type { AcceptanceRule, LengthUnit, MethodSummary } from '@limitbook/contracts';
import { outputKeyLabel, outputKeyUnit } from './field-meta';
import { formatNumber } from './format-number';
import { convertLength } from './units';

const operatorWords: Record<AcceptanceRule['operator'], string> = {
  '>=': 'at least',
  '<=': 'at most',
  '>': 'more than',
  '<': 'less than',
  '==': 'equal to',
  between: 'between',
};

/** The label of an output path: `minWall` → "Minimum wall", `worstCase.min` → "Worst case, min". */
export function outputPathLabel(path: string, method: MethodSummary | undefined): string {
  const [head = path, ...rest] = path.split('.');
  const top = method?.outputs.find((output) => output.name === head)?.label ?? outputKeyLabel(head);
  return rest.length === 0 ? top : `${top}, ${rest.map((key) => outputKeyLabel(key).toLowerCase()).join(', ')}`;
}

/** Whether the output at `path` is a length, so a rule on it is stated in a unit. */
export function isLengthOutput(path: string, method: MethodSummary | undefined): boolean {
  const [head = path, ...rest] = path.split('.');
  const kind = method?.outputs.find((output) => output.name === head)?.kind;
  if (rest.length === 0) return kind === 'length';
  return outputKeyUnit(rest.at(-1) ?? '', 'mm') === 'mm';
}

/**
 * The rule as sent with a request in `unit`: a limit written without a unit is in the block's
 * own unit, so it is pinned there before the reader switches unit.
 */
export function ruleForRequest(rule: AcceptanceRule | null | undefined, blockUnit: LengthUnit, method: MethodSummary | undefined): AcceptanceRule | null {
  if (!rule) return null;
  if (rule.unit || !isLengthOutput(rule.output, method)) return rule;
  return { ...rule, unit: blockUnit };
}

/** "Minimum wall at least 1.5 mm (0.059055 in)". */
export function acceptanceInWords(rule: AcceptanceRule, method: MethodSummary | undefined, blockUnit: LengthUnit, shownUnit: LengthUnit): string {
  const isLength = isLengthOutput(rule.output, method);
  const ruleUnit = isLength ? (rule.unit ?? blockUnit) : null;
  const limits = rule.operator === 'between' ? `${formatNumber(rule.value)} and ${formatNumber(rule.value2 ?? rule.value)}` : formatNumber(rule.value);
  let text = `${outputPathLabel(rule.output, method)} ${operatorWords[rule.operator]} ${limits}${ruleUnit ? ` ${ruleUnit}` : ''}`;
  if (ruleUnit && ruleUnit !== shownUnit) {
    const convert = (value: number) => formatNumber(convertLength(value, ruleUnit, shownUnit));
    const converted = rule.operator === 'between' ? `${convert(rule.value)} and ${convert(rule.value2 ?? rule.value)}` : convert(rule.value);
    text += ` (${converted} ${shownUnit})`;
  }
  return text;
}
