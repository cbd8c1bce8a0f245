import { formulaLimits, type DerivationStep } from '@limitbook/contracts';
import { isUnit, type MathNode } from 'mathjs';
import { EngineError } from '../core/engine-error.js';
import { describeQuantity, formulaValueProblem, quantityLatex, type FormulaQuantity, type FormulaValue } from './describe-quantity.js';
import { explainEvaluationError } from './explain-evaluation-error.js';
import { formulaNameProblem, shadowsUnit } from './formula-name-problem.js';
import { inspectExpression, type ExpressionProblem } from './inspect-expression.js';
import { parseFormulaValue } from './parse-formula-value.js';
import { sandboxedMath } from './sandboxed-math.js';

export interface FormulaSetDefinition {
  /** Input quantities by name: a number or text such as "12 mm". */
  inputs: Record<string, number | string>;
  /** In order; each "name = expression", or the two parts apart. */
  expressions: readonly (string | { name: string; expression: string })[];
  /** Expressions that must come out true, with an optional message for people. */
  checks?: readonly (string | { expression: string; message?: string | undefined })[];
}

export interface FormulaSetLimits {
  maxExpressions: number;
  maxChecks: number;
  maxValues: number;
  maxExpressionLength: number;
  /** Parsed nodes per expression; bounds evaluation work, since nothing loops. */
  maxNodes: number;
  /** Nesting of brackets, checked before parsing; bounds the parser's recursion. */
  maxBracketDepth: number;
  /** Depth of the parsed tree (a long sum is a deep tree); bounds the evaluator's recursion. */
  maxTreeDepth: number;
}

export const defaultFormulaSetLimits: FormulaSetLimits = {
  maxExpressions: formulaLimits.maxExpressions,
  maxChecks: formulaLimits.maxChecks,
  maxValues: formulaLimits.maxValues,
  maxExpressionLength: formulaLimits.maxExpressionLength,
  maxNodes: 400,
  maxBracketDepth: 40,
  maxTreeDepth: 250,
};

export interface FormulaCheckResult {
  expression: string;
  message?: string;
  pass: boolean;
  /** The check with every name replaced by its value. */
  detail: string;
}

export interface FormulaSetResult {
  inputs: Record<string, FormulaQuantity>;
  results: Record<string, FormulaQuantity>;
  checks: FormulaCheckResult[];
  steps: DerivationStep[];
  warnings: string[];
}

/**
 * Evaluates a set of named formulas with units in the locked-down mathjs instance. Problems
 * are collected per field (`values.<name>`, `expressions.<i>`, `checks.<i>`) and thrown
 * together as one EngineError: FORMULA_REFUSED when the sandbox refused something,
 * LIMIT_EXCEEDED for counts beyond the limits, otherwise INVALID_INPUT.
 */
export function evaluateFormulaSet(definition: FormulaSetDefinition, limits: FormulaSetLimits = defaultFormulaSetLimits): FormulaSetResult {
  const sandbox = sandboxedMath();
  const checks = definition.checks ?? [];
  const inputNames = Object.keys(definition.inputs);
  const tooMany: Record<string, string> = {};
  if (definition.expressions.length > limits.maxExpressions) tooMany.expressions = `At most ${limits.maxExpressions} expressions`;
  if (checks.length > limits.maxChecks) tooMany.checks = `At most ${limits.maxChecks} checks`;
  if (inputNames.length > limits.maxValues) tooMany.values = `At most ${limits.maxValues} values`;
  if (Object.keys(tooMany).length > 0) throw new EngineError('LIMIT_EXCEEDED', Object.values(tooMany)[0]!, tooMany);

  const problems = new ProblemList();
  const warnings: string[] = [];
  const scope = new Map<string, FormulaValue>();
  const failed = new Set<string>();
  const inputs: Record<string, FormulaQuantity> = {};

  for (const name of inputNames) {
    const field = `values.${name}`;
    const nameProblem = formulaNameProblem(name);
    if (nameProblem) {
      problems.add(field, { kind: 'invalid', message: nameProblem });
      failed.add(name);
      continue;
    }
    const parsed = parseFormulaValue(definition.inputs[name]!, sandbox);
    if ('problem' in parsed) {
      problems.add(field, { kind: 'invalid', message: parsed.problem });
      failed.add(name);
      continue;
    }
    scope.set(name, parsed.value);
    inputs[name] = describeQuantity(parsed.value, sandbox);
    if (shadowsUnit(name, sandbox)) warnings.push(unitShadowWarning(name));
  }

  const assignments = definition.expressions.map((entry, index) => splitAssignment(entry, index, limits, problems));
  const definedAt = new Map<string, number>();
  assignments.forEach((assignment, index) => {
    if (!assignment) return;
    const field = `expressions.${index}`;
    if (assignment.name in definition.inputs) {
      problems.add(field, { kind: 'invalid', message: `${assignment.name} is already an input value; choose another name` });
    } else if (definedAt.has(assignment.name)) {
      problems.add(field, { kind: 'invalid', message: `${assignment.name} is already defined in expression ${definedAt.get(assignment.name)! + 1}` });
    } else {
      definedAt.set(assignment.name, index);
      if (shadowsUnit(assignment.name, sandbox)) warnings.push(unitShadowWarning(assignment.name));
    }
  });

  const results: Record<string, FormulaQuantity> = {};
  const steps: DerivationStep[] = [];
  assignments.forEach((assignment, index) => {
    if (!assignment || definedAt.get(assignment.name) !== index) {
      if (assignment) failed.add(assignment.name);
      return;
    }
    const outcome = runExpression(assignment.expression, index, `expressions.${index}`);
    if (!outcome) {
      failed.add(assignment.name);
      return;
    }
    scope.set(assignment.name, outcome.value);
    const quantity = describeQuantity(outcome.value, sandbox);
    results[assignment.name] = quantity;
    steps.push(expressionStep(assignment.name, outcome.node, outcome.references, quantity));
  });

  const checkResults: FormulaCheckResult[] = [];
  checks.forEach((entry, index) => {
    const field = `checks.${index}`;
    const expression = typeof entry === 'string' ? entry : entry.expression;
    const message = typeof entry === 'string' ? undefined : entry.message;
    if (expression.length > limits.maxExpressionLength) {
      problems.add(field, refusedLength(limits));
      return;
    }
    const outcome = runExpression(expression, definition.expressions.length, field);
    if (!outcome) return;
    if (typeof outcome.value !== 'boolean') {
      problems.add(field, { kind: 'invalid', message: 'A check must be a comparison that is true or false, such as squeeze >= 0.15' });
      return;
    }
    checkResults.push({ expression, ...(message ? { message } : {}), pass: outcome.value, detail: substitutedText(outcome.node, outcome.references) });
  });

  problems.throwIfAny();
  return { inputs, results, checks: checkResults, steps, warnings };

  function runExpression(text: string, position: number, field: string): { node: MathNode; value: FormulaValue; references: Set<string> } | undefined {
    const depth = bracketDepth(text);
    if (depth > limits.maxBracketDepth) {
      problems.add(field, { kind: 'refused', message: `Refused: brackets nest deeper than ${limits.maxBracketDepth} levels` });
      return undefined;
    }
    let node: MathNode;
    try {
      node = sandbox.parse(text);
    } catch (error) {
      problems.add(field, { kind: 'invalid', message: `Cannot read the expression: ${error instanceof Error ? error.message : String(error)}` });
      return undefined;
    }
    const inspection = inspectExpression(
      node,
      {
        isDefined: (name) => scope.has(name) || failed.has(name),
        definedLaterAt: (name) => {
          const at = definedAt.get(name);
          return at !== undefined && at >= position ? at : undefined;
        },
        isUnit: (name) => shadowsUnit(name, sandbox),
        position,
      },
      limits,
    );
    if ('kind' in inspection) {
      problems.add(field, inspection);
      return undefined;
    }
    // A name whose own expression failed is already reported there; don't repeat it here.
    if ([...inspection.references].some((name) => failed.has(name))) return undefined;
    let value: unknown;
    try {
      value = node.compile().evaluate(new Map(scope));
    } catch (error) {
      problems.add(field, { kind: 'invalid', message: explainEvaluationError(node, scope, error) });
      return undefined;
    }
    const valueProblem = formulaValueProblem(value);
    if (valueProblem) {
      problems.add(field, { kind: 'invalid', message: valueProblem });
      return undefined;
    }
    return { node, value: value as FormulaValue, references: inspection.references };
  }

  function expressionStep(name: string, node: MathNode, references: Set<string>, quantity: FormulaQuantity): DerivationStep {
    const nameTex = new sandbox.math.SymbolNode(name).toTex().trim();
    const symbolic = node.toTex().trim();
    const substituted = node.toTex({ handler: substitutionHandler(references, (value) => valueLatex(value)) }).trim();
    const parts = [nameTex, symbolic, ...(references.size > 0 && substituted !== symbolic ? [substituted] : []), quantityLatex(quantity, sandbox.parse)];
    return { label: name, latex: parts.join(' = '), value: quantity.text };
  }

  function valueLatex(value: FormulaValue): string {
    const quantity = describeQuantity(value, sandbox);
    const tex = quantityLatex(quantity, sandbox.parse);
    return isUnit(value) || (typeof quantity.value === 'number' && quantity.value < 0) ? `\\left(${tex}\\right)` : tex;
  }

  function substitutedText(node: MathNode, references: Set<string>): string {
    return node.toString({
      handler: substitutionHandler(references, (value) => {
        const quantity = describeQuantity(value, sandbox);
        return isUnit(value) || (typeof quantity.value === 'number' && quantity.value < 0) ? `(${quantity.text})` : quantity.text;
      }),
    });
  }

  function substitutionHandler(references: Set<string>, render: (value: FormulaValue) => string) {
    return (node: MathNode): string | undefined => {
      if (node.type !== 'SymbolNode') return undefined;
      const name = (node as unknown as { name: string }).name;
      return references.has(name) ? render(scope.get(name)!) : undefined;
    };
  }
}

const assignmentPattern = /^\s*([A-Za-z][A-Za-z0-9_]*)\s*=(?!=)([\s\S]*)$/;

function splitAssignment(
  entry: string | { name: string; expression: string },
  index: number,
  limits: FormulaSetLimits,
  problems: ProblemList,
): { name: string; expression: string } | undefined {
  const field = `expressions.${index}`;
  const text = typeof entry === 'string' ? entry : entry.expression;
  if (text.length > limits.maxExpressionLength) {
    problems.add(field, refusedLength(limits));
    return undefined;
  }
  let assignment: { name: string; expression: string };
  if (typeof entry === 'string') {
    const match = assignmentPattern.exec(entry);
    if (!match) {
      problems.add(field, { kind: 'invalid', message: 'Write each expression as name = expression, for example squeeze = (d - h) / d' });
      return undefined;
    }
    assignment = { name: match[1]!, expression: match[2]! };
  } else {
    assignment = entry;
  }
  const nameProblem = formulaNameProblem(assignment.name);
  if (nameProblem) {
    problems.add(field, { kind: 'invalid', message: nameProblem });
    return undefined;
  }
  if (assignment.expression.trim() === '') {
    problems.add(field, { kind: 'invalid', message: `Give an expression after ${assignment.name} =` });
    return undefined;
  }
  return assignment;
}

function refusedLength(limits: FormulaSetLimits): ExpressionProblem {
  return { kind: 'refused', message: `Refused: an expression is at most ${limits.maxExpressionLength} characters` };
}

function bracketDepth(text: string): number {
  let depth = 0;
  let deepest = 0;
  for (const character of text) {
    if (character === '(' || character === '[' || character === '{') deepest = Math.max(deepest, ++depth);
    else if (character === ')' || character === ']' || character === '}') depth -= 1;
  }
  return deepest;
}

function unitShadowWarning(name: string): string {
  return `${name} is also a unit; in these formulas ${name} means your value, not the unit`;
}

class ProblemList {
  private readonly fields: Record<string, string> = {};
  private refused = false;

  add(field: string, problem: ExpressionProblem): void {
    if (field in this.fields) return;
    this.fields[field] = problem.message;
    if (problem.kind === 'refused') this.refused = true;
  }

  throwIfAny(): void {
    const [first] = Object.values(this.fields);
    if (first === undefined) return;
    throw new EngineError(this.refused ? 'FORMULA_REFUSED' : 'INVALID_INPUT', first, this.fields);
  }
}
