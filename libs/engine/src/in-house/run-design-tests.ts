import type { DesignDefinition, TestRowResult, TestRun } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';
import { checkMethodDesign } from './check-method-design.js';
import { evaluateMethodDesign } from './evaluate-method-design.js';

/**
 * Runs every row of a design's test table. A design that cannot be evaluated at all is thrown
 * as an EngineError with the definition's fields; a row whose values are refused fails on
 * its own with the messages in `errors`. An expected value passes within its tolerance, or,
 * with tolerance 0, when it equals the output rounded to the output's decimals.
 */
export function runDesignTests(definition: DesignDefinition): TestRun {
  const check = checkMethodDesign(definition);
  if (Object.keys(check.problems).length > 0) {
    throw new EngineError(check.refused ? 'FORMULA_REFUSED' : 'INVALID_INPUT', Object.values(check.problems)[0]!, check.problems);
  }
  const decimalsByOutput = new Map(definition.outputs.map((output) => [output.name, output.decimals]));
  const unitByOutput = new Map(definition.outputs.map((output) => [output.name, output.unit]));
  const rows = definition.tests.map((row, index): TestRowResult => {
    const base = { index, label: row.label, expectedVerdict: row.expectedVerdict };
    let evaluation;
    try {
      evaluation = evaluateMethodDesign(definition, row.inputs);
    } catch (error) {
      if (!(error instanceof EngineError)) throw error;
      const outputs = Object.entries(row.expected).map(([output, expectation]) => ({
        output,
        expected: expectation.value,
        tolerance: expectation.tolerance,
        actual: null,
        difference: null,
        unit: unitByOutput.get(output) ?? '',
        pass: false,
      }));
      return { ...base, pass: false, outputs, verdict: null, errors: error.fields };
    }
    const outputs = Object.entries(row.expected).map(([output, expectation]) => {
      const actual = evaluation.outputs[output]?.value;
      const value = typeof actual === 'number' ? actual : null;
      const decimals = decimalsByOutput.get(output) ?? 3;
      const difference = value === null ? null : Number((value - expectation.value).toPrecision(12));
      const pass =
        value !== null &&
        (expectation.tolerance > 0
          ? Math.abs(value - expectation.value) <= expectation.tolerance * (1 + 1e-9)
          : Number(value.toFixed(decimals)) === Number(expectation.value.toFixed(decimals)));
      return { output, expected: expectation.value, tolerance: expectation.tolerance, actual: value, difference, unit: unitByOutput.get(output) ?? '', pass };
    });
    const verdict = evaluation.verdict ? (evaluation.verdict.pass ? 'pass' : 'fail') : null;
    const verdictPass = row.expectedVerdict === null || row.expectedVerdict === (verdict ?? 'pass');
    return { ...base, pass: verdictPass && outputs.every((output) => output.pass), outputs, verdict, errors: {} };
  });
  const passed = rows.filter((row) => row.pass).length;
  return { pass: rows.length > 0 && passed === rows.length, passed, failed: rows.length - passed, rows };
}

/** One message per failing row, for refusing a submission (`tests.2`: "Row 3 …: squeezeMax expected 21.5 ± 0.1, got 22.3"). */
export function failingRowMessages(run: TestRun): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const row of run.rows) {
    if (row.pass) continue;
    const name = `Row ${row.index + 1}${row.label ? ` (${row.label})` : ''}`;
    const errors = Object.values(row.errors);
    if (errors.length > 0) {
      fields[`tests.${row.index}`] = `${name} cannot be evaluated: ${errors[0]}`;
      continue;
    }
    const wrong = row.outputs.filter((output) => !output.pass).map((output) => `${output.output} expected ${output.expected}${output.tolerance > 0 ? ` ± ${output.tolerance}` : ''}${output.unit ? ` ${output.unit}` : ''}, got ${output.actual ?? 'nothing'}`);
    if (row.expectedVerdict !== null && row.expectedVerdict !== (row.verdict ?? 'pass')) wrong.push(`verdict expected ${row.expectedVerdict}, got ${row.verdict ?? 'none'}`);
    fields[`tests.${row.index}`] = `${name} fails: ${wrong.join('; ')}`;
  }
  return fields;
}
