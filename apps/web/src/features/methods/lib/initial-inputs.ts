import type { Field } from '@/components/calculator';

/** The values a method's schema gives by default, nested as the inputs are. */
export function initialInputs(fields: readonly Field[]): Record<string, unknown> {
  const value: Record<string, unknown> = {};
  for (const field of fields) {
    if ((field.kind === 'number' || field.kind === 'enum') && field.defaultValue !== undefined) value[field.name] = field.defaultValue;
    else if (field.kind === 'enum' && field.required) value[field.name] = field.options[0]?.value;
    else if (field.kind === 'object') {
      const inner = initialInputs(field.fields);
      if (Object.keys(inner).length > 0) value[field.name] = inner;
    }
  }
  return value;
}

/** Whether the defaults alone fill every required number, so the method can run before anything is typed. */
export function defaultsComplete(fields: readonly Field[], value: Record<string, unknown>): boolean {
  return fields.every((field) => {
    if (!field.required) return true;
    const own = value[field.name];
    if (field.kind === 'object') return !!own && typeof own === 'object' && defaultsComplete(field.fields, own as Record<string, unknown>);
    if (field.kind === 'number' || field.kind === 'enum' || field.kind === 'text') return own !== undefined && own !== null && own !== '';
    return own !== undefined;
  });
}
