import type { DesignDefinition } from '@limitbook/contracts';
import { formulaNameProblem } from '../formula/formula-name-problem.js';
import type { SandboxedMath } from '../formula/sandboxed-math.js';
import { parseUnitText, quantityUnitProblem } from './quantity-unit.js';

/**
 * What is wrong with a design before anything is evaluated: names, units that do not fit the
 * input's kind, display units mathjs does not know, test rows naming inputs or outputs that do
 * not exist. Keyed by the design's fields.
 */
export function designProblems(definition: DesignDefinition, sandbox: SandboxedMath): Record<string, string> {
  const problems: Record<string, string> = {};
  const seen = new Map<string, string>();
  const claim = (name: string, field: string, what: string) => {
    const nameProblem = formulaNameProblem(name);
    if (nameProblem) problems[`${field}.name`] = nameProblem;
    else if (seen.has(name)) problems[`${field}.name`] = `${name} is already the name of ${seen.get(name)}`;
    else seen.set(name, what);
  };
  definition.inputs.forEach((input, index) => {
    claim(input.name, `inputs.${index}`, `input ${index + 1}`);
    const unitProblem = quantityUnitProblem(input.kind, input.unit, sandbox);
    if (unitProblem) problems[`inputs.${index}.unit`] = unitProblem;
  });
  for (const [section, entries, what] of [
    ['intermediates', definition.intermediates, 'intermediate'],
    ['outputs', definition.outputs, 'output'],
  ] as const) {
    entries.forEach((formula, index) => {
      claim(formula.name, `${section}.${index}`, `${what} ${index + 1}`);
      if (formula.unit !== '' && !parseUnitText(formula.unit, sandbox)) problems[`${section}.${index}.unit`] = `"${formula.unit}" is not a unit mathjs knows (write mm, MPa, N, deg…)`;
    });
  }
  if (definition.outputs.length === 0) problems.outputs = 'Add at least one output';

  const inputNames = new Set(definition.inputs.map((input) => input.name));
  const outputNames = new Set(definition.outputs.map((output) => output.name));
  definition.tests.forEach((row, index) => {
    for (const name of Object.keys(row.inputs)) {
      if (!inputNames.has(name)) problems[`tests.${index}.inputs.${name}`] = `${name} is not an input of this method`;
    }
    for (const name of Object.keys(row.expected)) {
      if (!outputNames.has(name)) problems[`tests.${index}.expected.${name}`] = `${name} is not an output of this method`;
    }
    if (Object.keys(row.expected).length === 0 && row.expectedVerdict === null) problems[`tests.${index}.expected`] = 'Give at least one expected output or the expected verdict';
  });
  return problems;
}
