import { ActionIcon, Alert, Button, Fieldset, Group, Input, SegmentedControl, Select, Stack, Table, Text, TextInput, Tooltip } from '@mantine/core';
import type { LengthUnit } from '@limitbook/contracts';
import { IconLock, IconPlus, IconTrash } from '@tabler/icons-react';
import { useMemo, useState, type ReactNode } from 'react';
import { formatNumber, parseNumberText } from './lib/format-number';
import {
  describeInputs,
  fieldPaths,
  getAtPath,
  setAtPath,
  type CheckListField,
  type EnumField,
  type Field,
  type JsonSchema,
  type NumberField,
  type TableField,
  type TextField,
  type TextListField,
  type ValueMapField,
} from './lib/json-schema';
import classes from './method-inputs-form.module.css';
import { canImportTable, TableCsvImport } from './table-csv-import';

export type MethodInputsFormProps = {
  /** The method's `inputSchema` from the catalog. */
  schema: JsonSchema | Record<string, unknown>;
  /** The method id, for labels that depend on it. */
  method?: string;
  value: Record<string, unknown>;
  onChange: (next: Record<string, unknown>) => void;
  /** The unit lengths are typed in; shown after every length field. */
  unit: LengthUnit;
  /** Input paths shown read-only with a lock (e.g. `arrangement`, `contributors.0.nominal`, or `contributors` for a whole table). */
  locked?: readonly string[];
  /** Messages by input path; the server's `inputs.` prefix is accepted and dropped. */
  errors?: Record<string, string>;
  /** Everything read-only (e.g. a block whose method is unknown). */
  readOnly?: boolean;
  /** Tooltip of the lock icon. */
  lockHint?: string;
  /** Something to show beside a field's label, such as an author's lock toggle. */
  renderFieldAction?: (path: string) => ReactNode;
};

type Context = {
  unit: LengthUnit;
  method?: string;
  value: Record<string, unknown>;
  set: (path: string, next: unknown) => void;
  isLocked: (path: string) => boolean;
  errorAt: (path: string) => string | undefined;
  lockHint: string;
  renderFieldAction?: (path: string) => ReactNode;
};

function stripInputsPrefix(errors: Record<string, string> | undefined): Record<string, string> {
  const result: Record<string, string> = {};
  for (const [path, message] of Object.entries(errors ?? {})) result[path.replace(/^inputs\./, '')] = message;
  return result;
}

function LockMark({ hint }: { hint: string }) {
  return (
    <Tooltip label={hint}>
      <span className={classes.lock} aria-label={hint} role="img" tabIndex={0}>
        <IconLock size={14} stroke={1.8} aria-hidden />
      </span>
    </Tooltip>
  );
}

function FieldLabel({ field, locked, context }: { field: Field; locked: boolean; context: Context }) {
  return (
    <span className={classes.label}>
      {field.label}
      {locked && <LockMark hint={context.lockHint} />}
      {context.renderFieldAction?.(field.path)}
    </span>
  );
}

function toNumberText(value: unknown): string {
  return typeof value === 'number' ? formatNumber(value).replace('−', '-') : typeof value === 'string' ? value : '';
}

/** A number typed as text: what was typed stays on screen, the value follows it when it reads as a number. */
function NumberInputField({
  field,
  path,
  context,
  compact = false,
}: {
  field: NumberField;
  path: string;
  context: Context;
  compact?: boolean;
}) {
  const value = getAtPath(context.value, path);
  const [text, setText] = useState(() => toNumberText(value));
  const [shown, setShown] = useState(value);
  if (shown !== value) {
    // Follow changes from outside (unit toggle, reset) without fighting the person typing.
    setShown(value);
    if (parseNumberText(text) !== value && !(text.trim() === '' && value == null) && text !== value) setText(toNumberText(value));
  }

  const locked = context.isLocked(path);
  const error = context.errorAt(path);
  const onChange = (next: string) => {
    setText(next);
    if (next.trim() === '') {
      context.set(path, field.nullable ? null : undefined);
      return;
    }
    const parsed = parseNumberText(next);
    // Unreadable text goes to the server as typed, which answers at this field.
    context.set(path, parsed ?? next);
  };

  return (
    <TextInput
      label={compact ? undefined : <FieldLabel field={field} locked={locked} context={context} />}
      aria-label={compact ? field.label : undefined}
      description={compact ? undefined : field.description}
      value={text}
      onChange={(event) => onChange(event.currentTarget.value)}
      readOnly={locked}
      inputMode="decimal"
      autoComplete="off"
      spellCheck={false}
      error={error}
      size={compact ? 'xs' : 'sm'}
      placeholder={field.nullable || !field.required ? (field.defaultValue !== undefined ? `${formatNumber(field.defaultValue)} (default)` : compact ? undefined : 'Not set') : undefined}
      leftSection={compact && locked ? <LockMark hint={context.lockHint} /> : undefined}
      rightSection={field.length && !compact ? <span className={classes.unit}>{context.unit}</span> : undefined}
      rightSectionPointerEvents="none"
      classNames={{ input: classes.numberInput }}
      data-locked={locked || undefined}
      data-path={path}
    />
  );
}

function EnumInputField({ field, path, context, compact = false }: { field: EnumField; path: string; context: Context; compact?: boolean }) {
  const raw = getAtPath(context.value, path);
  const locked = context.isLocked(path);
  const error = context.errorAt(path);
  const none = '__none__';
  const options = [...field.options.map((option) => ({ value: String(option.value), label: option.label }))];
  if (field.nullable || (!field.required && field.defaultValue === undefined)) options.push({ value: none, label: field.nullable ? 'None' : 'Not set' });
  if (compact && field.name === 'sense') for (const option of options) option.label = option.value === '1' ? '+' : option.value === '-1' ? '−' : option.label;
  const current = raw === undefined || raw === null ? (field.defaultValue !== undefined ? String(field.defaultValue) : none) : String(raw);
  const onChange = (next: string | null) => {
    if (next === null || next === none) return context.set(path, field.nullable ? null : undefined);
    const option = field.options.find((item) => String(item.value) === next);
    context.set(path, option ? option.value : next);
  };
  const short = !compact && options.length <= 4 && options.every((option) => option.label.length <= 14);

  if (short) {
    return (
      <Input.Wrapper label={<FieldLabel field={field} locked={locked} context={context} />} description={field.description} error={error} data-path={path}>
        <div>
          <SegmentedControl
            data={options}
            value={current}
            onChange={onChange}
            readOnly={locked}
            size="sm"
            className={classes.segmented}
            data-locked={locked || undefined}
            aria-label={field.label}
          />
        </div>
      </Input.Wrapper>
    );
  }
  return (
    <Select
      label={compact ? undefined : <FieldLabel field={field} locked={locked} context={context} />}
      aria-label={compact ? field.label : undefined}
      description={compact ? undefined : field.description}
      data={options}
      value={current}
      onChange={onChange}
      readOnly={locked}
      allowDeselect={false}
      size={compact ? 'xs' : 'sm'}
      error={error}
      leftSection={compact && locked ? <LockMark hint={context.lockHint} /> : undefined}
      data-locked={locked || undefined}
      data-path={path}
    />
  );
}

function TextInputField({ field, path, context, compact = false }: { field: TextField; path: string; context: Context; compact?: boolean }) {
  const raw = getAtPath(context.value, path);
  const locked = context.isLocked(path);
  return (
    <TextInput
      label={compact ? undefined : <FieldLabel field={field} locked={locked} context={context} />}
      aria-label={compact ? field.label : undefined}
      description={compact ? undefined : field.description}
      value={typeof raw === 'string' ? raw : raw == null ? '' : String(raw)}
      onChange={(event) => {
        const next = event.currentTarget.value;
        context.set(path, next === '' && !field.required ? undefined : next);
      }}
      readOnly={locked}
      maxLength={field.maxLength}
      size={compact ? 'xs' : 'sm'}
      error={context.errorAt(path)}
      leftSection={compact && locked ? <LockMark hint={context.lockHint} /> : undefined}
      autoComplete="off"
      data-locked={locked || undefined}
      data-path={path}
    />
  );
}

function RowActions({ label, onRemove, disabled }: { label: string; onRemove: () => void; disabled: boolean }) {
  return (
    <ActionIcon variant="subtle" color="gray" onClick={onRemove} disabled={disabled} aria-label={label}>
      <IconTrash size={16} />
    </ActionIcon>
  );
}

function TableInputField({ field, context }: { field: TableField; context: Context }) {
  const rows = (getAtPath(context.value, field.path) as Record<string, unknown>[] | undefined) ?? [];
  const tableLocked = context.isLocked(field.path);
  const rowLabel = (row: Record<string, unknown>, index: number) =>
    typeof row.name === 'string' && row.name ? row.name : typeof row.label === 'string' && row.label ? row.label : `row ${index + 1}`;
  // A new row gets a name in the column the table names its rows by.
  const namedBy = field.columns.find((column) => column.name === 'name' || column.name === 'label')?.name;
  const noun = field.name === 'contributors' ? 'contributor' : field.name === 'features' ? 'feature' : 'row';
  const error = context.errorAt(field.path);

  return (
    <Input.Wrapper label={<FieldLabel field={field} locked={tableLocked} context={context} />} description={field.description} error={error} data-path={field.path}>
      <Table.ScrollContainer minWidth={700} className={classes.tableScroll}>
        <Table withTableBorder withColumnBorders verticalSpacing={4} horizontalSpacing={6} className={classes.table}>
          <Table.Thead>
            <Table.Tr>
              {field.columns.map((column) => (
                <Table.Th key={column.name} className={classes[`column-${column.kind === 'number' ? 'number' : column.name === 'sense' ? 'sense' : column.kind}`]}>
                  {column.label}
                  {column.kind === 'number' && column.length ? <span className={classes.labelUnit}>({context.unit})</span> : null}
                </Table.Th>
              ))}
              {!tableLocked && (
                <Table.Th>
                  <span className={classes.visuallyHidden}>Remove</span>
                </Table.Th>
              )}
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {rows.map((row, index) => (
              <Table.Tr key={index}>
                {field.columns.map((column) => (
                  <Table.Td key={column.name}>{renderField({ ...column, label: `${column.label}, ${rowLabel(row, index)}` }, `${field.path}.${index}.${column.name}`, context, true)}</Table.Td>
                ))}
                {!tableLocked && (
                  <Table.Td>
                    <RowActions
                      label={`Remove ${rowLabel(row, index)}`}
                      disabled={rows.length <= 1 || context.isLocked(`${field.path}.${index}`)}
                      onRemove={() => context.set(field.path, rows.filter((_row, position) => position !== index))}
                    />
                  </Table.Td>
                )}
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      {!tableLocked && (
        <Button
          variant="subtle"
          size="compact-sm"
          mt={6}
          leftSection={<IconPlus size={14} />}
          onClick={() => context.set(field.path, [...rows, { ...field.newRow, ...(namedBy ? { [namedBy]: `${noun === 'row' ? 'Row' : noun.charAt(0).toUpperCase() + noun.slice(1)} ${rows.length + 1}` } : {}) }])}
        >
          Add {noun}
        </Button>
      )}
      {!tableLocked && context.method && canImportTable(context.method, field.name) && (
        <TableCsvImport
          method={context.method}
          input={field.name}
          label={field.label}
          unit={context.unit}
          onRows={(imported, mode) => context.set(field.path, mode === 'append' ? [...rows, ...imported] : imported)}
        />
      )}
    </Input.Wrapper>
  );
}

function TextListInputField({ field, context }: { field: TextListField; context: Context }) {
  const items = (getAtPath(context.value, field.path) as unknown[] | undefined) ?? [];
  const locked = context.isLocked(field.path);
  return (
    <Input.Wrapper label={<FieldLabel field={field} locked={locked} context={context} />} description={field.description} error={context.errorAt(field.path)}>
      <Stack gap={6} mt={4}>
        {items.map((item, index) => (
          <Group key={index} gap={6} wrap="nowrap">
            <TextInput
              aria-label={`${field.label} ${index + 1}`}
              value={String(item ?? '')}
              onChange={(event) => context.set(`${field.path}.${index}`, event.currentTarget.value)}
              readOnly={locked}
              error={context.errorAt(`${field.path}.${index}`)}
              classNames={{ input: classes.code }}
              className={classes.grow}
              spellCheck={false}
              data-path={`${field.path}.${index}`}
            />
            {!locked && (
              <RowActions label={`Remove ${field.label.toLowerCase()} ${index + 1}`} disabled={items.length <= 1} onRemove={() => context.set(field.path, items.filter((_item, position) => position !== index))} />
            )}
          </Group>
        ))}
        {!locked && (
          <Button variant="subtle" size="compact-sm" w="fit-content" leftSection={<IconPlus size={14} />} onClick={() => context.set(field.path, [...items, ''])}>
            Add expression
          </Button>
        )}
      </Stack>
    </Input.Wrapper>
  );
}

function ValueMapInputField({ field, context }: { field: ValueMapField; context: Context }) {
  const map = (getAtPath(context.value, field.path) as Record<string, unknown> | undefined) ?? {};
  const entries = Object.entries(map);
  const locked = context.isLocked(field.path);
  const rename = (from: string, to: string) => {
    const next: Record<string, unknown> = {};
    for (const [key, item] of entries) next[key === from ? to : key] = item;
    context.set(field.path, next);
  };
  return (
    <Input.Wrapper label={<FieldLabel field={field} locked={locked} context={context} />} description={field.description} error={context.errorAt(field.path)}>
      <Stack gap={6} mt={4}>
        {entries.map(([name, item], index) => {
          const itemPath = `${field.path}.${name}`;
          const itemLocked = locked || context.isLocked(itemPath);
          return (
            <Group key={index} gap={6} wrap="nowrap" align="flex-start">
              <TextInput
                aria-label={`Name of value ${index + 1}`}
                value={name}
                onChange={(event) => rename(name, event.currentTarget.value)}
                readOnly={locked}
                classNames={{ input: classes.code }}
                w={170}
                spellCheck={false}
              />
              <TextInput
                aria-label={name}
                value={typeof item === 'number' ? formatNumber(item).replace('−', '-') : String(item ?? '')}
                onChange={(event) => {
                  const text = event.currentTarget.value;
                  const number = parseNumberText(text);
                  context.set(itemPath, number ?? text);
                }}
                readOnly={itemLocked}
                error={context.errorAt(itemPath)}
                leftSection={itemLocked && !locked ? <LockMark hint={context.lockHint} /> : undefined}
                classNames={{ input: classes.code }}
                className={classes.grow}
                spellCheck={false}
                data-path={itemPath}
              />
              {!locked && (
                <RowActions
                  label={`Remove ${name || `value ${index + 1}`}`}
                  disabled={false}
                  onRemove={() => context.set(field.path, Object.fromEntries(entries.filter(([key]) => key !== name)))}
                />
              )}
            </Group>
          );
        })}
        {!locked && (
          <Button
            variant="subtle"
            size="compact-sm"
            w="fit-content"
            leftSection={<IconPlus size={14} />}
            onClick={() => {
              let index = entries.length + 1;
              while (`value${index}` in map) index += 1;
              context.set(field.path, { ...map, [`value${index}`]: 0 });
            }}
          >
            Add value
          </Button>
        )}
      </Stack>
    </Input.Wrapper>
  );
}

function CheckListInputField({ field, context }: { field: CheckListField; context: Context }) {
  const items = (getAtPath(context.value, field.path) as unknown[] | undefined) ?? [];
  const locked = context.isLocked(field.path);
  const asObject = (item: unknown): { expression: string; message?: string } =>
    typeof item === 'string' ? { expression: item } : ((item as { expression: string; message?: string } | null) ?? { expression: '' });
  return (
    <Input.Wrapper label={<FieldLabel field={field} locked={locked} context={context} />} description={field.description} error={context.errorAt(field.path)}>
      <Stack gap={6} mt={4}>
        {items.map((item, index) => {
          const check = asObject(item);
          const update = (patch: Partial<{ expression: string; message: string }>) => {
            const next = { ...check, ...patch };
            context.set(`${field.path}.${index}`, next.message ? next : next.expression);
          };
          return (
            <Group key={index} gap={6} wrap="nowrap" align="flex-start">
              <TextInput
                aria-label={`Check ${index + 1}`}
                value={check.expression}
                onChange={(event) => update({ expression: event.currentTarget.value })}
                readOnly={locked}
                error={context.errorAt(`${field.path}.${index}`) ?? context.errorAt(`${field.path}.${index}.expression`)}
                classNames={{ input: classes.code }}
                className={classes.grow}
                spellCheck={false}
              />
              <TextInput
                aria-label={`Message of check ${index + 1}`}
                placeholder="Message when it fails"
                value={check.message ?? ''}
                onChange={(event) => update({ message: event.currentTarget.value })}
                readOnly={locked}
                className={classes.grow}
              />
              {!locked && <RowActions label={`Remove check ${index + 1}`} disabled={false} onRemove={() => context.set(field.path, items.filter((_item, position) => position !== index))} />}
            </Group>
          );
        })}
        {!locked && (
          <Button variant="subtle" size="compact-sm" w="fit-content" leftSection={<IconPlus size={14} />} onClick={() => context.set(field.path, [...items, ''])}>
            Add check
          </Button>
        )}
      </Stack>
    </Input.Wrapper>
  );
}

function JsonInputField({ field, context }: { field: Field; context: Context }) {
  const raw = getAtPath(context.value, field.path);
  const locked = context.isLocked(field.path);
  return (
    <TextInput
      label={<FieldLabel field={field} locked={locked} context={context} />}
      description={field.description ?? 'Written as JSON'}
      value={raw === undefined ? '' : JSON.stringify(raw)}
      onChange={(event) => {
        try {
          context.set(field.path, JSON.parse(event.currentTarget.value));
        } catch {
          context.set(field.path, event.currentTarget.value);
        }
      }}
      readOnly={locked}
      error={context.errorAt(field.path)}
      classNames={{ input: classes.code }}
      data-path={field.path}
    />
  );
}

function renderField(field: Field, path: string, context: Context, compact = false): ReactNode {
  switch (field.kind) {
    case 'number':
      return <NumberInputField key={path} field={field} path={path} context={context} compact={compact} />;
    case 'enum':
      return <EnumInputField key={path} field={field} path={path} context={context} compact={compact} />;
    case 'text':
      return <TextInputField key={path} field={field} path={path} context={context} compact={compact} />;
    case 'object':
      return (
        <Fieldset key={path} legend={<FieldLabel field={field} locked={context.isLocked(path)} context={context} />} variant="filled" className={classes.fieldset} data-path={path}>
          {field.description && (
            <Text size="xs" c="dimmed" mb={6}>
              {field.description}
            </Text>
          )}
          <div className={classes.grid}>{field.fields.map((child) => renderField(child, child.path, context))}</div>
          {context.errorAt(path) && (
            <Text size="xs" c="redline.7" mt={4}>
              {context.errorAt(path)}
            </Text>
          )}
        </Fieldset>
      );
    case 'table':
      return (
        <div key={path} className={classes.wide}>
          <TableInputField field={field} context={context} />
        </div>
      );
    case 'text-list':
      return (
        <div key={path} className={classes.wide}>
          <TextListInputField field={field} context={context} />
        </div>
      );
    case 'value-map':
      return (
        <div key={path} className={classes.wide}>
          <ValueMapInputField field={field} context={context} />
        </div>
      );
    case 'check-list':
      return (
        <div key={path} className={classes.wide}>
          <CheckListInputField field={field} context={context} />
        </div>
      );
    case 'json':
      return <JsonInputField key={path} field={field} context={context} />;
  }
}

/** The inputs of a method as a form generated from its JSON schema. Controlled: `value` in, `onChange` out. */
export function MethodInputsForm({ schema, method, value, onChange, unit, locked = [], errors, readOnly = false, lockHint = 'Set by the standard', renderFieldAction }: MethodInputsFormProps) {
  const fields = useMemo(() => describeInputs(schema, method), [schema, method]);
  const fieldErrors = useMemo(() => stripInputsPrefix(errors), [errors]);
  const known = useMemo(() => fieldPaths(fields, value), [fields, value]);
  const leftover = Object.entries(fieldErrors).filter(([path]) => !known.has(path));

  const context: Context = {
    unit,
    method,
    value,
    set: (path, next) => onChange(setAtPath(value, path, next)),
    // A locked object or table locks everything inside it.
    isLocked: (path) => readOnly || locked.some((lockedPath) => path === lockedPath || path.startsWith(`${lockedPath}.`)),
    errorAt: (path) => fieldErrors[path],
    lockHint,
    renderFieldAction,
  };

  if (fields.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        This method takes no inputs.
      </Text>
    );
  }

  return (
    <div className={classes.form}>
      {leftover.length > 0 && (
        <Alert color="redline" variant="light" className={classes.wide} p="xs">
          {leftover.map(([path, message]) => (
            <Text size="sm" key={path}>
              <span className={classes.code}>{path}</span>: {message}
            </Text>
          ))}
        </Alert>
      )}
      {fields.map((field) => renderField(field, field.path, context))}
    </div>
  );
}
