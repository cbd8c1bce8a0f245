/**
 * In-house formula methods: named mathjs expressions with units, evaluated in a locked-down
 * instance (see sandboxed-math.ts and inspect-expression.ts for what is allowed). Quantities
 * carry their own units, so the request's length unit does not apply. Evaluation is synchronous,
 * pure and bounded: at most 100 expressions of 500 characters and 400 nodes each, no loops,
 * function definitions, matrices or recursion, so one evaluation is a single pass.
 */
import { formulaInputSchema, type Verdict } from '@limitbook/contracts';
import { defineMethod } from '../core/method.js';
import type { FormulaQuantity } from './describe-quantity.js';
import { evaluateFormulaSet } from './evaluate-formula-set.js';

export const formulaMethod = defineMethod({
  id: 'formula',
  version: 1,
  title: 'Formula set',
  description:
    'Named formulas with units ("name = expression", mathjs syntax) evaluated in order from input quantities, with checks that make the verdict. The building block of in-house methods.',
  references: [
    'mathjs documentation, "Expression syntax" and "Units" (mathjs.org/docs/expressions)',
    'mathjs documentation, "Security" (mathjs.org/docs/expressions/security.html): functions that parse, compile or extend the instance are disabled',
  ],
  cautions: [
    'A formula method computes what its author wrote; it is not checked against any standard. Review the formulas and their test table before relying on them.',
    'Where a result bears on strength, pressure or safety, it does not replace the applicable codes and licensed engineering judgement.',
  ],
  inputSchema: formulaInputSchema,
  outputs: [
    {
      name: '<each name assigned>',
      label: 'Results',
      kind: 'object',
      description: 'One entry per assigned name: { value, unit, text }, unit null for plain numbers.',
    },
  ],
  evaluate(inputs) {
    const result = evaluateFormulaSet({ inputs: inputs.values, expressions: inputs.expressions, checks: inputs.checks });
    const verdict: Verdict | undefined =
      result.checks.length === 0
        ? undefined
        : {
            pass: result.checks.every((check) => check.pass),
            summary: `${result.checks.filter((check) => check.pass).length} of ${result.checks.length} checks hold`,
            checks: result.checks.map((check) => ({ label: check.message ?? check.expression, pass: check.pass, detail: check.detail })),
          };
    return {
      outputs: result.results as Record<string, FormulaQuantity>,
      ...(verdict ? { verdict } : {}),
      warnings: result.warnings,
      steps: result.steps,
    };
  },
});
