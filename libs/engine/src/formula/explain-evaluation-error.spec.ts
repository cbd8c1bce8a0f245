import { describe, expect, it } from 'vitest';
import { explainEvaluationError } from './explain-evaluation-error.js';
import { sandboxedMath } from './sandboxed-math.js';

const { parse, math } = sandboxedMath();

function explain(text: string, scope: Map<string, unknown>): string {
  const node = parse(text);
  try {
    node.compile().evaluate(new Map(scope));
  } catch (error) {
    return explainEvaluationError(node, scope, error);
  }
  throw new Error('expected the expression to fail');
}

describe('explainEvaluationError', () => {
  it('names the innermost failing operation and the kinds of its operands', () => {
    const scope = new Map<string, unknown>([['gap', math.unit('2 mm')], ['mass', math.unit('3 kg')]]);
    expect(explain('2 * (gap + mass) / 4', scope)).toBe('In gap + mass: units do not match (a quantity in mm (length) and a quantity in kg (mass))');
    expect(explain('gap < mass', scope)).toBe('In gap < mass: cannot compare a quantity in mm (length) with a quantity in kg (mass)');
    expect(explain('sqrt(gap) + 1', scope)).toBe('In sqrt(gap) + 1: cannot combine a quantity in mm^0.5 and the plain number 1');
  });
});
