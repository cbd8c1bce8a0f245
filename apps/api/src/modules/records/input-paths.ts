/** Reads and writes dotted input paths (`feature.lowerLimit`, `contributors.2.tolerance`), as calculator blocks lock them. */
export function valueAtPath(root: unknown, path: string): unknown {
  let current: unknown = root;
  for (const key of path.split('.')) {
    if (current === null || typeof current !== 'object' || !Object.hasOwn(current, key)) return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  return current;
}

/** Sets a value, creating objects (or arrays, for numeric keys) along the way. Mutates `root`. */
export function setAtPath(root: Record<string, unknown>, path: string, value: unknown): void {
  const keys = path.split('.');
  let current: Record<string, unknown> = root;
  keys.forEach((key, index) => {
    if (index === keys.length - 1) {
      current[key] = structuredClone(value);
      return;
    }
    const next = current[key];
    if (next === null || typeof next !== 'object') current[key] = /^\d+$/.test(keys[index + 1]!) ? [] : {};
    current = current[key] as Record<string, unknown>;
  });
}

/** Structural equality of JSON values; key order does not matter. */
export function sameJson(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (a === null || b === null || typeof a !== 'object' || typeof b !== 'object') return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  const aKeys = Object.keys(a);
  const bKeys = Object.keys(b);
  if (aKeys.length !== bKeys.length) return false;
  return aKeys.every((key) => Object.hasOwn(b, key) && sameJson((a as Record<string, unknown>)[key], (b as Record<string, unknown>)[key]));
}
