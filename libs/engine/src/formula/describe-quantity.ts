import { isUnit, type MathNode, type Unit } from 'mathjs';
import type { SandboxedMath } from './sandboxed-math.js';

export interface FormulaQuantity {
  /** The number in `unit` (12 significant digits, float noise removed), or a check's truth value. */
  value: number | boolean;
  /** mathjs unit text such as "mm" or "N / mm^2"; null for plain numbers and truth values. */
  unit: string | null;
  /** For people: six significant digits with the unit. */
  text: string;
}

export type FormulaValue = number | boolean | Unit;

/** Why a result cannot be reported, or undefined when it is a finite number, quantity or truth value. */
export function formulaValueProblem(value: unknown): string | undefined {
  if (typeof value === 'boolean') return undefined;
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : 'The result is not a finite number (a division by zero or an overflow?)';
  if (isUnit(value)) {
    if (value.value === null) return 'The result is a unit without a value';
    const magnitude = value.toNumeric();
    if (typeof magnitude !== 'number') return 'The result is complex (the square root of a negative number?)';
    return Number.isFinite(magnitude) ? undefined : 'The result is not a finite number (a division by zero or an overflow?)';
  }
  if (value !== null && typeof value === 'object' && 'im' in value) return 'The result is complex (the square root of a negative number?)';
  return 'The result is not a number, a quantity or true/false';
}

export function describeQuantity(value: FormulaValue, { math }: SandboxedMath): FormulaQuantity {
  if (typeof value === 'boolean') return { value, unit: null, text: String(value) };
  if (typeof value === 'number') {
    const clean = removeNoise(value);
    return { value: clean, unit: null, text: math.format(clean, { precision: 6 }) };
  }
  if (value.skipAutomaticSimplification) {
    // A unit as written or converted with `to` stays as it is (1500 mm is not turned into 1.5 m).
    const unit = value.formatUnits();
    const clean = removeNoise(value.toNumeric() as number);
    return { value: clean, unit, text: `${math.format(clean, { precision: 6 })} ${unit}` };
  }
  // A product or quotient is shown as mathjs formats it: simplest unit, best prefix (N / (mm mm) → MPa).
  const formatted = value.format({ precision: 14 });
  const space = formatted.indexOf(' ');
  const unit = formatted.slice(space + 1);
  const clean = removeNoise(Number(formatted.slice(0, space)));
  return { value: clean, unit, text: `${math.format(clean, { precision: 6 })} ${unit}` };
}

/** LaTeX of a reported quantity, the unit typeset by mathjs from its own unit text. */
export function quantityLatex(quantity: FormulaQuantity, parse: SandboxedMath['parse']): string {
  if (typeof quantity.value === 'boolean') return `\\text{${quantity.value}}`;
  const number = quantity.text.split(' ')[0]!.replace(/e([+-]?\d+)$/, '\\times 10^{$1}');
  if (quantity.unit === null) return number;
  let unitTex: string;
  try {
    unitTex = (parse(quantity.unit) as MathNode).toTex();
  } catch {
    unitTex = `\\text{${quantity.unit.replace(/[^A-Za-z0-9 /()]/g, '')}}`;
  }
  return `${number}\\,${unitTex}`;
}

function removeNoise(value: number): number {
  return value === 0 ? 0 : Number(value.toPrecision(12));
}
