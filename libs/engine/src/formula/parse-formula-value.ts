import type { Unit } from 'mathjs';
import type { SandboxedMath } from './sandboxed-math.js';

const plainNumber = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * An input value: a number, or text holding a number or a quantity such as "12 mm" or
 * "210 GPa". Text is read by mathjs' unit parser (`unit("…")`), which accepts only a number and
 * a unit, never an expression.
 */
export function parseFormulaValue(raw: number | string, { math }: SandboxedMath): { value: number | Unit } | { problem: string } {
  if (typeof raw === 'number') return Number.isFinite(raw) ? { value: raw } : { problem: 'Value must be a finite number' };
  const text = raw.trim();
  if (plainNumber.test(text)) {
    const value = Number(text);
    return Number.isFinite(value) ? { value } : { problem: 'Value must be a finite number' };
  }
  let quantity: Unit;
  try {
    quantity = math.unit(text);
  } catch {
    return { problem: `"${text}" is not a number or a quantity with a unit such as 12 mm` };
  }
  if (quantity.value === null) return { problem: `"${text}" is a unit without a value; write it as, for example, 12 ${text}` };
  const magnitude = quantity.toNumeric();
  if (typeof magnitude !== 'number' || !Number.isFinite(magnitude)) return { problem: 'Value must be a finite number' };
  return { value: quantity };
}
