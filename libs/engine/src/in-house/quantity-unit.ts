import { quantityKindBaseUnits, type QuantityKind } from '@limitbook/contracts';
import { isUnit, type Unit } from 'mathjs';
import type { SandboxedMath } from '../formula/sandboxed-math.js';

/** A unit written by the author (mm, MPa, N m), read by mathjs' unit parser: a unit, never an expression. */
export function parseUnitText(text: string, { math }: SandboxedMath): Unit | undefined {
  try {
    // A unit alone has no value ("1/mm" is the number 1 over mm, not a unit).
    if (!isUnit(math.unit(text)) || math.unit(text).value !== null) return undefined;
    const unit = math.unit(1, text);
    return isUnit(unit) ? unit : undefined;
  } catch {
    return undefined;
  }
}

/** Why `unit` cannot be the unit of a `kind` input, or undefined when it converts to the kind's base unit. */
export function quantityUnitProblem(kind: QuantityKind, unit: string, sandbox: SandboxedMath): string | undefined {
  const base = quantityKindBaseUnits[kind];
  if (base === null) return unit === '' ? undefined : `A dimensionless input takes no unit; leave the unit empty`;
  const parsed = parseUnitText(unit, sandbox);
  if (!parsed) return `"${unit}" is not a unit mathjs knows (write mm, MPa, N, deg, N m…)`;
  if (!parsed.equalBase(parseUnitText(base, sandbox)!)) return `${unit} is not a unit of ${kind.replace('-', ' ')} (for example ${exampleUnit(kind)})`;
  return undefined;
}

function exampleUnit(kind: QuantityKind): string {
  const examples: Record<QuantityKind, string> = {
    length: 'mm or in',
    area: 'mm^2',
    angle: 'deg',
    force: 'N or kN',
    pressure: 'bar or MPa',
    stress: 'MPa or GPa',
    torque: 'N m',
    mass: 'kg',
    temperature: 'degC or K',
    dimensionless: 'no unit',
  };
  return examples[kind];
}
