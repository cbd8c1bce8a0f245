import { type DefinitionChange, type DesignDefinition } from '@limitbook/contracts';
import { diffWords } from 'diff';

type Entry = Record<string, unknown>;

/** Settings shown as text; objects (test values) as sorted JSON so key order does not count as a change. */
function settingText(value: unknown): string | null {
  if (value === undefined || value === null || value === '') return null;
  if (typeof value === 'object') return JSON.stringify(sortKeys(value));
  return String(value);
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value && typeof value === 'object') {
    return Object.fromEntries(
      Object.entries(value as Record<string, unknown>)
        .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
        .map(([key, entry]) => [key, sortKeys(entry)]),
    );
  }
  return value;
}

function wordDiff(from: string | null, to: string | null): DefinitionChange['text'] {
  if (from === null || to === null || from === to) return null;
  return diffWords(from, to).map((part) => ({ kind: part.added ? 'added' : part.removed ? 'removed' : 'unchanged', text: part.value }));
}

/** Rows for the settings of one entry that differ; `textField` (an expression or a text) also gets a word diff. */
function entryChange(section: DefinitionChange['section'], key: string, from: Entry | undefined, to: Entry | undefined, textField?: string): DefinitionChange | undefined {
  const fields = [...new Set([...Object.keys(from ?? {}), ...Object.keys(to ?? {})])];
  const rows = fields
    .map((field) => ({ field, from: from ? settingText(from[field]) : null, to: to ? settingText(to[field]) : null }))
    .filter((row) => row.from !== row.to);
  if (rows.length === 0) return undefined;
  const change = !from ? 'added' : !to ? 'removed' : 'changed';
  const text = textField && change === 'changed' ? wordDiff(settingText(from![textField]), settingText(to![textField])) : null;
  return { section, key, change, rows, text };
}

/** Inputs and formulas are matched by name (a rename is a removal and an addition); checks, texts and test rows by position. */
function byName(section: 'inputs' | 'intermediates' | 'outputs', from: readonly Entry[], to: readonly Entry[], textField?: string): DefinitionChange[] {
  const before = new Map(from.map((entry) => [String(entry.name), entry]));
  const after = new Map(to.map((entry) => [String(entry.name), entry]));
  const names = [...new Set([...before.keys(), ...after.keys()])];
  return names.flatMap((name) => entryChange(section, name, before.get(name), after.get(name), textField) ?? []);
}

function byPosition(section: DefinitionChange['section'], from: readonly Entry[], to: readonly Entry[], textField?: string): DefinitionChange[] {
  const length = Math.max(from.length, to.length);
  return Array.from({ length }, (_, index) => entryChange(section, `#${index + 1}`, from[index], to[index], textField) ?? []).flat();
}

const asEntries = (texts: readonly string[]): Entry[] => texts.map((text) => ({ text }));

/** What changed from one definition to another, section by section, as rows a reviewer can read. */
export function compareDefinitions(from: DesignDefinition, to: DesignDefinition): DefinitionChange[] {
  const general = (['name', 'description', 'safetyCritical'] as const).flatMap(
    (field) => entryChange('general', field, { [field]: from[field] }, { [field]: to[field] }, field === 'description' ? field : undefined) ?? [],
  );
  return [
    ...general,
    ...byName('inputs', from.inputs, to.inputs),
    ...byName('intermediates', from.intermediates, to.intermediates, 'expression'),
    ...byName('outputs', from.outputs, to.outputs, 'expression'),
    ...byPosition('checks', from.checks, to.checks, 'expression'),
    ...byPosition('references', asEntries(from.references), asEntries(to.references), 'text'),
    ...byPosition('cautions', asEntries(from.cautions), asEntries(to.cautions), 'text'),
    ...byPosition('tests', from.tests, to.tests),
  ];
}
