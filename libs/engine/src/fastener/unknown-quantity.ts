import { fastenerQuantities, type FastenerQuantity } from '@limitbook/contracts';

/** The one quantity left empty (the input schema guarantees exactly one). */
export function unknownQuantity(inputs: Partial<Record<FastenerQuantity, number | null>>): FastenerQuantity {
  const missing = fastenerQuantities.filter((key) => typeof inputs[key] !== 'number');
  if (missing.length !== 1) throw new Error(`Expected exactly one unknown quantity, found ${missing.length}`);
  return missing[0]!;
}
