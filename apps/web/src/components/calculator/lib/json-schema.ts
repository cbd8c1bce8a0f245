import { fieldLabel, isLengthField, optionLabel } from './field-meta';

/** The part of JSON Schema (draft 2020-12, as zod emits it) that method input schemas use. */
export type JsonSchema = {
  type?: string | string[];
  enum?: unknown[];
  const?: unknown;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  properties?: Record<string, JsonSchema>;
  required?: string[];
  items?: JsonSchema;
  additionalProperties?: boolean | JsonSchema;
  /** A display label the method states itself (in-house methods carry their author's labels). */
  title?: string;
  description?: string;
  default?: unknown;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
  maxLength?: number;
};

type FieldBase = {
  /** Dotted path from the inputs' root; array items appear as `contributors.0.nominal` once rendered. */
  path: string;
  name: string;
  label: string;
  description?: string;
  required: boolean;
  nullable: boolean;
};

export type NumberField = FieldBase & { kind: 'number'; length: boolean; integer: boolean; defaultValue?: number };
export type EnumField = FieldBase & { kind: 'enum'; options: { value: string | number; label: string }[]; defaultValue?: string | number };
export type TextField = FieldBase & { kind: 'text'; maxLength?: number };
export type ObjectField = FieldBase & { kind: 'object'; fields: Field[] };
/** A list of records edited as a table (stack-up contributors); `columns` have paths relative to one row. */
export type TableField = FieldBase & { kind: 'table'; columns: Field[]; newRow: Record<string, unknown> };
/** A list of plain strings (formula expressions). */
export type TextListField = FieldBase & { kind: 'text-list' };
/** A name → number-or-quantity map (formula values). */
export type ValueMapField = FieldBase & { kind: 'value-map' };
/** A list of "expression" or { expression, message } (formula checks). */
export type CheckListField = FieldBase & { kind: 'check-list' };
/** Anything the form cannot model: edited as JSON. */
export type JsonField = FieldBase & { kind: 'json' };

export type Field = NumberField | EnumField | TextField | ObjectField | TableField | TextListField | ValueMapField | CheckListField | JsonField;

/** Whether any number among the fields (nested ones too) is a length, so the mm/inch switch applies. */
export function hasLengthInput(fields: readonly Field[]): boolean {
  return fields.some(
    (field) => (field.kind === 'number' && field.length) || (field.kind === 'object' && hasLengthInput(field.fields)) || (field.kind === 'table' && hasLengthInput(field.columns)),
  );
}

function typesOf(schema: JsonSchema): string[] {
  if (Array.isArray(schema.type)) return schema.type;
  return schema.type ? [schema.type] : [];
}

/** Splits `anyOf: [X, {type: null}]` and `type: [X, 'null']` into X and a nullable flag. */
function unwrapNullable(schema: JsonSchema): { schema: JsonSchema; nullable: boolean } {
  const types = typesOf(schema);
  if (types.includes('null') && types.length > 1) {
    const rest = types.filter((type) => type !== 'null');
    return { schema: { ...schema, type: rest.length === 1 ? rest[0] : rest }, nullable: true };
  }
  const variants = schema.anyOf ?? schema.oneOf;
  if (variants) {
    const nonNull = variants.filter((variant) => !typesOf(variant).includes('null') || typesOf(variant).length > 1);
    if (nonNull.length < variants.length) {
      const inner = nonNull.length === 1 ? { description: schema.description, ...nonNull[0] } : { ...schema, anyOf: nonNull, oneOf: undefined };
      return { schema: inner, nullable: true };
    }
  }
  return { schema, nullable: false };
}

function constOptions(variants: JsonSchema[]): (string | number)[] | null {
  const values = variants.map((variant) => variant.const);
  return values.every((value) => typeof value === 'string' || typeof value === 'number') ? (values as (string | number)[]) : null;
}

function isStringOrObjectList(items: JsonSchema | undefined): boolean {
  const variants = items?.anyOf ?? items?.oneOf;
  return !!variants && variants.some((variant) => typesOf(variant).includes('string')) && variants.some((variant) => typesOf(variant).includes('object'));
}

function emptyRow(columns: Field[]): Record<string, unknown> {
  const row: Record<string, unknown> = {};
  for (const column of columns) {
    if (column.kind === 'enum' && column.defaultValue !== undefined) row[column.name] = column.defaultValue;
    else if (column.kind === 'enum' && column.required) row[column.name] = column.options[0]?.value;
    else if (column.kind === 'text' && column.required) row[column.name] = '';
    else if (column.kind === 'number' && column.required) row[column.name] = 0;
  }
  return row;
}

function describeField(name: string, path: string, raw: JsonSchema, required: boolean, parentName?: string, method?: string): Field {
  const { schema, nullable } = unwrapNullable(raw);
  const base: FieldBase = {
    path,
    name,
    label: schema.title || raw.title || fieldLabel(name, path, parentName, method),
    description: schema.description ?? raw.description,
    required,
    nullable,
  };
  const types = typesOf(schema);
  const variants = schema.anyOf ?? schema.oneOf;

  if (schema.enum || (variants && constOptions(variants))) {
    const values = (schema.enum as (string | number)[] | undefined) ?? constOptions(variants ?? []) ?? [];
    const defaultValue = typeof schema.default === 'string' || typeof schema.default === 'number' ? schema.default : undefined;
    return { ...base, kind: 'enum', options: values.map((value) => ({ value, label: optionLabel(name, value) })), defaultValue };
  }
  if (types.includes('number') || types.includes('integer')) {
    return {
      ...base,
      kind: 'number',
      integer: types.includes('integer'),
      length: isLengthField(name, base.description),
      defaultValue: typeof schema.default === 'number' ? schema.default : undefined,
    };
  }
  if (types.includes('string')) return { ...base, kind: 'text', maxLength: schema.maxLength };
  if (types.includes('array')) {
    const items = schema.items;
    if (items && typesOf(items).includes('string') && !isStringOrObjectList(items)) return { ...base, kind: 'text-list' };
    if (isStringOrObjectList(items)) return { ...base, kind: 'check-list' };
    if (items && typesOf(items).includes('object') && items.properties) {
      const columns = describeObject(items, '', name, method).map((column) => ({ ...column, path: column.name }));
      return { ...base, kind: 'table', columns, newRow: emptyRow(columns) };
    }
    return { ...base, kind: 'json' };
  }
  if (types.includes('object')) {
    if (schema.properties) return { ...base, kind: 'object', fields: describeObject(schema, path, name, method) };
    if (schema.additionalProperties && typeof schema.additionalProperties === 'object') return { ...base, kind: 'value-map' };
  }
  return { ...base, kind: 'json' };
}

function describeObject(schema: JsonSchema, prefix: string, parentName?: string, method?: string): Field[] {
  const required = new Set(schema.required ?? []);
  return Object.entries(schema.properties ?? {}).map(([name, property]) =>
    describeField(name, prefix ? `${prefix}.${name}` : name, property, required.has(name), parentName, method),
  );
}

/** The form's model of a method's input schema: one field per property, nested as the schema nests. */
export function describeInputs(schema: JsonSchema | Record<string, unknown>, method?: string): Field[] {
  const root = schema as JsonSchema;
  if (!root.properties) return [];
  return describeObject(root, '', undefined, method);
}

/** Every length leaf of `fields` as concrete paths into `value` (table rows expanded). */
export function lengthPaths(fields: Field[], value: Record<string, unknown>): string[] {
  const paths: string[] = [];
  for (const field of fields) {
    if (field.kind === 'number' && field.length) paths.push(field.path);
    else if (field.kind === 'object') paths.push(...lengthPaths(field.fields, value));
    else if (field.kind === 'table') {
      const rows = getAtPath(value, field.path);
      if (Array.isArray(rows)) {
        rows.forEach((_row, index) => {
          for (const column of field.columns) {
            if (column.kind === 'number' && column.length) paths.push(`${field.path}.${index}.${column.name}`);
          }
        });
      }
    }
  }
  return paths;
}

/** Every input path the form shows for `value`, to tell which server messages it can place at a field. */
export function fieldPaths(fields: Field[], value: Record<string, unknown>): Set<string> {
  const paths = new Set<string>();
  for (const field of fields) {
    paths.add(field.path);
    if (field.kind === 'object') for (const path of fieldPaths(field.fields, value)) paths.add(path);
    if (field.kind === 'table') {
      const rows = getAtPath(value, field.path);
      if (Array.isArray(rows)) {
        rows.forEach((_row, index) => {
          paths.add(`${field.path}.${index}`);
          for (const column of field.columns) paths.add(`${field.path}.${index}.${column.name}`);
        });
      }
    }
  }
  return paths;
}

export function getAtPath(root: unknown, path: string): unknown {
  let current: unknown = root;
  for (const key of path.split('.')) {
    if (current === null || typeof current !== 'object') return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  return current;
}

/** A copy of `root` with `value` at `path` (undefined removes the key); arrays stay arrays. */
export function setAtPath<T>(root: T, path: string, value: unknown): T {
  const [key, ...rest] = path.split('.');
  if (key === undefined) return root;
  const container: Record<string, unknown> | unknown[] = Array.isArray(root) ? [...root] : { ...(root as Record<string, unknown> | undefined) };
  const current = (container as Record<string, unknown>)[key];
  const next = rest.length === 0 ? value : setAtPath(current ?? (/^\d+$/.test(rest[0] ?? '') ? [] : {}), rest.join('.'), value);
  if (next === undefined && !Array.isArray(container)) delete (container as Record<string, unknown>)[key];
  else (container as Record<string, unknown>)[key] = next;
  return container as T;
}
