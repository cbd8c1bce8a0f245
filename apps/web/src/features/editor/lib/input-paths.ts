type JsonSchema = {
  type?: string | string[];
  properties?: Record<string, JsonSchema>;
  anyOf?: JsonSchema[];
  title?: string;
  description?: string;
};

export type InputLeaf = { path: string; label: string };

function words(name: string): string {
  const spaced = name.replace(/([a-z0-9])([A-Z])/g, '$1 $2').replace(/[_-]+/g, ' ').toLowerCase();
  return spaced.charAt(0).toUpperCase() + spaced.slice(1);
}

function isObjectSchema(schema: JsonSchema): boolean {
  const types = Array.isArray(schema.type) ? schema.type : [schema.type];
  return types.includes('object') && !!schema.properties;
}

/**
 * The inputs of a method that can be locked one by one: every leaf of its input JSON schema,
 * by dotted path (`feature.lowerLimit`) with a readable label (`Feature › Lower limit`).
 * Lists are locked whole, by their own path.
 */
export function inputLeaves(schema: unknown, prefix = '', labelPrefix = ''): InputLeaf[] {
  const node = schema as JsonSchema | null;
  if (!node || typeof node !== 'object' || !node.properties) return [];
  const leaves: InputLeaf[] = [];
  for (const [name, child] of Object.entries(node.properties)) {
    const path = prefix ? `${prefix}.${name}` : name;
    const label = labelPrefix ? `${labelPrefix} › ${words(name)}` : words(name);
    const objectBranch = isObjectSchema(child) ? child : child.anyOf?.find(isObjectSchema);
    if (objectBranch) leaves.push(...inputLeaves(objectBranch, path, label));
    else leaves.push({ path, label });
  }
  return leaves;
}

export function valueAtPath(root: unknown, path: string): unknown {
  let current: unknown = root;
  for (const key of path.split('.')) {
    if (current === null || typeof current !== 'object' || !Object.hasOwn(current, key)) return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  return current;
}

/** Whether a default is set at `path` (the server refuses a locked input without one). */
export function hasDefault(defaults: unknown, path: string): boolean {
  const value = valueAtPath(defaults, path);
  return value !== undefined && value !== '';
}
