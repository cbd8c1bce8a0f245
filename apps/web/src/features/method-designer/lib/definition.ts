import type { DesignFormula, DesignInput, DesignTestRow, DesignDefinition } from '@limitbook/contracts';

export function emptyDefinition(name = ''): DesignDefinition {
  return { name, description: '', inputs: [], intermediates: [], outputs: [], checks: [], references: [], cautions: [], safetyCritical: false, tests: [] };
}

export function newInput(index: number): DesignInput {
  return { name: `x${index + 1}`, label: '', kind: 'length', unit: 'mm', default: null, min: null, max: null, help: '' };
}

export function newFormula(prefix: string, index: number): DesignFormula {
  return { name: `${prefix}${index + 1}`, label: '', expression: '', unit: '', decimals: 3 };
}

export function newTestRow(): DesignTestRow {
  return { label: '', inputs: {}, expected: {}, expectedVerdict: null };
}

/**
 * Field messages from the server, keyed as the form's fields are. Save and preview bodies wrap
 * the definition, so their paths start with `definition.`; values of a preview start with `values.`.
 */
export function definitionProblems(fields: Record<string, string> | undefined): Record<string, string> {
  const problems: Record<string, string> = {};
  for (const [path, message] of Object.entries(fields ?? {})) problems[path.replace(/^definition\./, '')] = message;
  return problems;
}

/** Messages that belong to no field the designer shows (whole sections, the body itself). */
export function unplacedProblems(problems: Record<string, string>, shownPaths: ReadonlySet<string>): string[] {
  return Object.entries(problems)
    .filter(([path]) => !shownPaths.has(path) && !path.startsWith('tests.'))
    .map(([path, message]) => (path ? `${path}: ${message}` : message));
}

/** Every path the designer puts a message at. */
export function definitionFieldPaths(definition: DesignDefinition): Set<string> {
  const paths = new Set(['name', 'description', 'inputs', 'intermediates', 'outputs', 'checks', 'references', 'cautions', 'tests']);
  definition.inputs.forEach((_input, index) => {
    for (const key of ['name', 'label', 'kind', 'unit', 'default', 'min', 'max', 'help']) paths.add(`inputs.${index}.${key}`);
  });
  for (const list of ['intermediates', 'outputs'] as const) {
    definition[list].forEach((_formula, index) => {
      for (const key of ['name', 'label', 'expression', 'unit', 'decimals']) paths.add(`${list}.${index}.${key}`);
    });
  }
  definition.checks.forEach((_check, index) => {
    paths.add(`checks.${index}.expression`);
    paths.add(`checks.${index}.message`);
  });
  definition.references.forEach((_text, index) => paths.add(`references.${index}`));
  definition.cautions.forEach((_text, index) => paths.add(`cautions.${index}`));
  return paths;
}

/** A definition written out with sorted keys, so equal definitions compare equal. */
export function definitionKey(definition: unknown): string {
  return JSON.stringify(definition, (_key, value: unknown) =>
    value && typeof value === 'object' && !Array.isArray(value) ? Object.fromEntries(Object.entries(value as Record<string, unknown>).sort(([a], [b]) => a.localeCompare(b))) : value,
  );
}

/** Renaming an input or output renames its column in every test row, so typed values are not lost. */
export function renameInTests(tests: DesignTestRow[], section: 'inputs' | 'expected', from: string, to: string): DesignTestRow[] {
  if (from === to) return tests;
  return tests.map((row) => {
    const values = row[section] as Record<string, unknown>;
    if (!(from in values)) return row;
    const next: Record<string, unknown> = {};
    for (const [key, value] of Object.entries(values)) next[key === from ? to : key] = value;
    return { ...row, [section]: next };
  });
}

/** What an output shows: the computed value at its declared decimals. */
export function roundTo(value: number, decimals: number | undefined): number {
  return decimals === undefined ? value : Number(value.toFixed(decimals));
}
