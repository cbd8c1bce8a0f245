import { type DerivationStep, type DesignDefinition, type Verdict } from '@limitbook/contracts';
import { EngineError, type EngineErrorCode } from '../core/engine-error.js';
import { quantityLatex, type FormulaQuantity } from '../formula/describe-quantity.js';
import { evaluateFormulaSet, type FormulaSetResult } from '../formula/evaluate-formula-set.js';
import { sandboxedMath, type SandboxedMath } from '../formula/sandboxed-math.js';
import { designFieldPath } from './design-field-paths.js';
import { designProblems } from './design-problems.js';
import { parseUnitText } from './quantity-unit.js';

/** Values by input name: a number in the input's unit, or a quantity with its own unit ("2.8 mm"). */
export type DesignValues = Record<string, number | string>;

export interface DesignOutputValue extends FormulaQuantity {
  label: string;
}

export interface DesignEvaluation {
  /** Outputs in their declared units; `value` to 12 significant digits, `text` with the declared decimals. */
  outputs: Record<string, DesignOutputValue>;
  verdict?: Verdict;
  warnings: string[];
  steps: DerivationStep[];
  /** The input values used (after defaults), in each input's unit. */
  inputs: Record<string, number>;
}

export interface DesignEvaluationOptions {
  /**
   * Give inputs without a value and without a default a sample value (the middle of the
   * range, else 1) so a draft's formulas and units can be checked before anyone fills them in.
   */
  sampleMissing?: boolean;
}

/**
 * Evaluates an in-house method design: input values with units, intermediates and outputs in
 * order in the formula sandbox, results converted into the declared units, checks for the
 * verdict. Problems are thrown as one EngineError whose fields are the design's own
 * (`outputs.1.expression`, `inputs.0.unit`) or the values' (`values.depth`).
 */
export function evaluateMethodDesign(definition: DesignDefinition, values: DesignValues, options: DesignEvaluationOptions = {}): DesignEvaluation {
  const sandbox = sandboxedMath();
  const problems: Record<string, string> = { ...designProblems(definition, sandbox) };
  const resolved = resolveValues(definition, values, options, sandbox, problems);

  const formulaSet = {
    inputs: resolved.formulaInputs,
    expressions: [...definition.intermediates, ...definition.outputs].map(({ name, expression }) => ({ name, expression })),
    checks: definition.checks.map(({ expression, message }) => ({ expression, message })),
  };
  let formulas: FormulaSetResult | undefined;
  let code: EngineErrorCode = 'INVALID_INPUT';
  try {
    formulas = evaluateFormulaSet(formulaSet);
  } catch (error) {
    if (!(error instanceof EngineError)) throw error;
    if (error.code === 'FORMULA_REFUSED' || error.code === 'LIMIT_EXCEEDED') code = error.code;
    for (const [field, message] of Object.entries(error.fields)) {
      const path = designFieldPath(field, definition);
      // Inputs whose name, unit or value failed are already reported at the input or value.
      if (path.startsWith('values.') && (resolved.failed.has(path.slice(7)) || !(path.slice(7) in resolved.formulaInputs))) continue;
      problems[path] ??= message;
    }
    // Only checks failed: the formulas did evaluate, and a result in the wrong unit (the usual
    // reason a check cannot compare) is reported at its own expression too.
    if (Object.keys(error.fields).every((field) => field.startsWith('checks.'))) {
      try {
        const withoutChecks = evaluateFormulaSet({ ...formulaSet, checks: [] });
        presentFormulas(definition, withoutChecks, sandbox, problems);
      } catch {
        // Already reported above.
      }
    }
  }
  if (formulas === undefined || Object.keys(problems).length > 0) throw designError(code, problems);

  const { outputs, steps } = presentFormulas(definition, formulas, sandbox, problems);
  if (Object.keys(problems).length > 0) throw designError('INVALID_INPUT', problems);

  const verdict: Verdict | undefined =
    formulas.checks.length === 0
      ? undefined
      : {
          pass: formulas.checks.every((check) => check.pass),
          summary: `${formulas.checks.filter((check) => check.pass).length} of ${formulas.checks.length} checks hold`,
          checks: formulas.checks.map((check) => ({ label: check.message ?? check.expression, pass: check.pass, detail: check.detail })),
        };
  // The safety caution goes with the method's cautions (describeMethodDesign), shown beside every result like the built-ins'.
  const warnings = [...resolved.warnings, ...formulas.warnings];
  return { outputs, ...(verdict ? { verdict } : {}), warnings, steps, inputs: resolved.inputValues };
}

/** Intermediates and outputs in their declared units with a derivation step each; unit mismatches go to `problems`. */
function presentFormulas(
  definition: DesignDefinition,
  formulas: FormulaSetResult,
  sandbox: SandboxedMath,
  problems: Record<string, string>,
): { outputs: Record<string, DesignOutputValue>; steps: DerivationStep[] } {
  const outputs: Record<string, DesignOutputValue> = {};
  const steps: DerivationStep[] = [];
  const stepsByName = new Map(formulas.steps.map((step) => [step.label, step]));
  const formulaEntries = [
    ...definition.intermediates.map((formula, index) => ({ formula, field: `intermediates.${index}`, isOutput: false })),
    ...definition.outputs.map((formula, index) => ({ formula, field: `outputs.${index}`, isOutput: true })),
  ];
  for (const { formula, field, isOutput } of formulaEntries) {
    const computed = formulas.results[formula.name]!;
    const shown = inDisplayUnit(computed, formula.unit, formula.decimals, isOutput, sandbox);
    if ('problem' in shown) {
      problems[`${field}.expression`] = shown.problem;
      continue;
    }
    if (isOutput) outputs[formula.name] = { ...shown.quantity, label: formula.label };
    const step = stepsByName.get(formula.name)!;
    const converted = shown.quantity.unit !== computed.unit ? ` = ${quantityLatex(shown.quantity, sandbox.parse)}` : '';
    steps.push({ label: formula.label, latex: `${step.latex}${converted}`, value: shown.quantity.text });
  }
  return { outputs, steps };
}

function designError(code: EngineErrorCode, fields: Record<string, string>): EngineError {
  const [first] = Object.values(fields);
  return new EngineError(code, first ?? 'The method cannot be evaluated', fields);
}

interface ResolvedValues {
  formulaInputs: Record<string, number | string>;
  /** Inputs given a placeholder that cannot be read, so formulas using them are skipped rather than reported as undefined. */
  failed: Set<string>;
  inputValues: Record<string, number>;
  warnings: string[];
}

function resolveValues(
  definition: DesignDefinition,
  values: DesignValues,
  options: DesignEvaluationOptions,
  sandbox: SandboxedMath,
  problems: Record<string, string>,
): ResolvedValues {
  const formulaInputs: Record<string, number | string> = {};
  const inputValues: Record<string, number> = {};
  const warnings: string[] = [];
  const failed = new Set<string>();
  const fail = (name: string) => {
    failed.add(name);
    formulaInputs[name] = '?';
  };
  const known = new Set(definition.inputs.map((input) => input.name));
  for (const name of Object.keys(values)) {
    if (!known.has(name)) problems[`values.${name}`] = `${name} is not an input of this method`;
  }
  definition.inputs.forEach((input, index) => {
    const field = `values.${input.name}`;
    if (problems[`inputs.${index}.name`]) return;
    if (problems[`inputs.${index}.unit`]) return fail(input.name);
    const given = Object.hasOwn(values, input.name) ? values[input.name] : undefined;
    let amount: number;
    if (given === undefined) {
      if (input.default !== null) amount = input.default;
      else if (options.sampleMissing) amount = input.min !== null && input.max !== null ? (input.min + input.max) / 2 : (input.min ?? input.max ?? 1);
      else {
        problems[field] = `Give a value for ${input.label}`;
        return fail(input.name);
      }
    } else if (typeof given === 'number') {
      amount = given;
    } else {
      const converted = quantityInUnit(given, input.unit, sandbox);
      if ('problem' in converted) {
        problems[field] = converted.problem;
        return fail(input.name);
      }
      amount = converted.value;
    }
    if (!Number.isFinite(amount)) {
      problems[field] = `${input.label} must be a finite number`;
      return fail(input.name);
    }
    const unitText = input.unit === '' ? '' : ` ${input.unit}`;
    if (input.min !== null && amount < input.min) {
      problems[field] = `${input.label} must be at least ${input.min}${unitText}`;
      fail(input.name);
    } else if (input.max !== null && amount > input.max) {
      problems[field] = `${input.label} must be at most ${input.max}${unitText}`;
      fail(input.name);
    } else {
      inputValues[input.name] = amount;
      // The number is written out in full so the unit parser reads exactly this value.
      formulaInputs[input.name] = input.unit === '' ? amount : `${numberText(amount)} ${input.unit}`;
    }
  });
  return { formulaInputs, failed, inputValues, warnings };
}

function numberText(value: number): string {
  return String(value);
}

/** A quantity written with its own unit ("0.11 in"), converted into the input's unit. */
function quantityInUnit(text: string, unit: string, sandbox: SandboxedMath): { value: number } | { problem: string } {
  const trimmed = text.trim();
  const plain = Number(trimmed);
  if (trimmed !== '' && Number.isFinite(plain)) return { value: plain };
  if (unit === '') return { problem: `"${trimmed}" is not a number` };
  let quantity;
  try {
    quantity = sandbox.math.unit(trimmed);
  } catch {
    return { problem: `"${trimmed}" is not a number or a quantity such as 2.8 ${unit}` };
  }
  const target = parseUnitText(unit, sandbox);
  if (quantity.value === null || !target || !quantity.equalBase(target)) return { problem: `"${trimmed}" cannot be converted to ${unit}` };
  return { value: quantity.toNumber(unit) };
}

/** The result in the declared unit with the declared decimals, or why its dimension does not fit. */
function inDisplayUnit(
  computed: FormulaQuantity,
  unit: string,
  decimals: number,
  isOutput: boolean,
  sandbox: SandboxedMath,
): { quantity: FormulaQuantity } | { problem: string } {
  if (typeof computed.value === 'boolean') return { problem: 'The result is true/false; a comparison belongs in the checks' };
  let value = computed.value;
  let shownUnit: string | null = computed.unit;
  if (computed.unit === null) {
    if (unit !== '') return { problem: `Result is a plain number but the ${isOutput ? "output's" : "intermediate's"} unit is ${unit}` };
  } else if (unit === '') {
    if (isOutput) return { problem: `Result is in ${computed.unit}: give the output a unit of that kind` };
  } else {
    const target = parseUnitText(unit, sandbox);
    if (!target) return { problem: `"${unit}" is not a unit mathjs knows` };
    try {
      const quantity = sandbox.math.unit(computed.value, computed.unit);
      if (!quantity.equalBase(target)) return { problem: `Result is in ${computed.unit} but the ${isOutput ? "output's" : "intermediate's"} unit is ${unit}` };
      value = quantity.toNumber(unit);
    } catch (error) {
      return { problem: `Cannot show the result (${computed.text}) in ${unit}: ${error instanceof Error ? error.message : String(error)}` };
    }
    shownUnit = unit;
  }
  const clean = value === 0 ? 0 : Number(value.toPrecision(12));
  const text = `${clean.toFixed(decimals)}${shownUnit ? ` ${shownUnit}` : ''}`;
  return { quantity: { value: clean, unit: shownUnit, text } };
}
