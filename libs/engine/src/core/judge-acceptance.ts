import type { AcceptanceRule, EvaluationResult, Verdict, VerdictCheck } from '@limitbook/contracts';
import { EngineError } from './engine-error.js';
import { formatNumber, fromMm, toMm } from './units.js';

const operatorSymbols: Record<AcceptanceRule['operator'], string> = { '>=': '≥', '<=': '≤', '>': '>', '<': '<', '==': '=', between: 'between' };

// Outputs are rounded for display; a limit equal to the shown value must pass, so compare at that resolution.
const comparisonTolerance = 1e-9;

/** The numeric value at a dotted output path; formula outputs carry theirs in `{ value }`. */
function numericOutput(outputs: Record<string, unknown>, path: string): number | undefined {
  let current: unknown = outputs;
  for (const key of path.split('.')) {
    if (current === null || typeof current !== 'object' || !Object.hasOwn(current, key)) return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  if (typeof current === 'number' && Number.isFinite(current)) return current;
  if (current !== null && typeof current === 'object' && typeof (current as { value?: unknown }).value === 'number') {
    return (current as { value: number }).value;
  }
  return undefined;
}

function inResultUnit(limit: number, rule: AcceptanceRule, result: EvaluationResult): number {
  if (!rule.unit || rule.unit === result.unit) return limit;
  return fromMm(toMm(limit, rule.unit), result.unit);
}

function compare(value: number, rule: AcceptanceRule, low: number, high: number | undefined): boolean {
  const tolerance = comparisonTolerance * Math.max(1, Math.abs(low), Math.abs(high ?? 0));
  switch (rule.operator) {
    case '>=':
      return value >= low - tolerance;
    case '<=':
      return value <= low + tolerance;
    case '>':
      return value > low + tolerance;
    case '<':
      return value < low - tolerance;
    case '==':
      return Math.abs(value - low) <= tolerance;
    case 'between':
      return value >= low - tolerance && value <= (high ?? low) + tolerance;
  }
}

/**
 * Judges a calculator block's acceptance rule on an evaluated result and folds it into the
 * verdict: the rule's check comes first, the method's own checks follow, and the block passes
 * only when all of them do.
 */
export function judgeAcceptance(result: EvaluationResult, rule: AcceptanceRule): EvaluationResult {
  const value = numericOutput(result.outputs, rule.output);
  if (value === undefined) {
    throw new EngineError('INVALID_INPUT', `Method ${result.method} has no numeric output "${rule.output}"`, {
      output: `Method ${result.method} has no numeric output "${rule.output}"`,
    });
  }
  const low = inResultUnit(rule.value, rule, result);
  const high = rule.value2 === undefined ? undefined : inResultUnit(rule.value2, rule, result);
  const pass = compare(value, rule, low, high);
  const unitText = rule.unit ? ` ${rule.unit}` : '';
  const ruleText =
    rule.operator === 'between'
      ? `${rule.output} between ${formatNumber(rule.value)} and ${formatNumber(rule.value2 ?? rule.value)}${unitText}`
      : `${rule.output} ${operatorSymbols[rule.operator]} ${formatNumber(rule.value)}${unitText}`;
  const check: VerdictCheck = {
    label: `Acceptance rule: ${ruleText}`,
    pass,
    detail: `${rule.output} = ${formatNumber(value)}${rule.unit ? ` ${result.unit}` : ''}`,
  };
  const methodChecks = result.verdict?.checks ?? [];
  const allPass = pass && (result.verdict?.pass ?? true);
  const verdict: Verdict = {
    pass: allPass,
    summary: pass ? (allPass ? `Meets the rule ${ruleText}` : `Meets the rule ${ruleText}, but a method check fails`) : `Fails the rule ${ruleText}`,
    checks: [check, ...methodChecks],
  };
  return { ...result, verdict };
}
