import { describe, expect, it } from 'vitest';
import { inspectExpression, type InspectionScope } from './inspect-expression.js';
import { sandboxedMath } from './sandboxed-math.js';

const { parse, math } = sandboxedMath();
const scope: InspectionScope = {
  isDefined: (name) => ['a', 'b'].includes(name),
  definedLaterAt: (name) => (name === 'later' ? 4 : undefined),
  isUnit: (name) => math.Unit.isValuelessUnit(name),
  position: 2,
};
const limits = { maxNodes: 50, maxTreeDepth: 10 };
const inspect = (text: string) => inspectExpression(parse(text), scope, limits);

describe('inspectExpression', () => {
  it('allows arithmetic, units, comparisons, conditionals and allow-listed functions, and lists the names used', () => {
    expect(inspect('sqrt(a^2 + b^2) to mm')).toEqual({ references: new Set(['a', 'b']) });
    expect(inspect('a > 2 mm ? max(a, 3 mm) : -b * pi')).toEqual({ references: new Set(['a', 'b']) });
    expect(inspect('1 mm < a <= 3 mm')).toEqual({ references: new Set(['a']) });
  });

  it('refuses every node type outside the allow-list with the reason', () => {
    expect(inspect('a.b')).toEqual({ kind: 'refused', message: 'Refused: property and index access are not allowed' });
    expect(inspect('f(x) = x')).toEqual({ kind: 'refused', message: 'Refused: defining functions is not allowed' });
    expect(inspect('[1, 2]')).toEqual({ kind: 'refused', message: 'Refused: matrices, vectors and ranges are not allowed' });
    expect(inspect('"text"')).toMatchObject({ kind: 'refused', message: expect.stringMatching(/text in quotes/) });
    expect(inspect('zeros(3)')).toMatchObject({ kind: 'refused', message: expect.stringMatching(/^Refused: zeros\(\) is not an allowed function/) });
    expect(inspect('a & b')).toEqual({ kind: 'refused', message: 'Refused: the operator & is not allowed' });
  });

  it('bounds the number of nodes and the depth of the tree', () => {
    expect(inspect(`max(${Array.from({ length: 60 }, () => 'a').join(', ')})`)).toMatchObject({ message: 'Refused: it has more than 50 terms' });
    expect(inspect('-'.repeat(12) + 'a')).toMatchObject({ message: 'Refused: it nests deeper than 10 levels' });
  });

  it('tells undefined names from names defined further down', () => {
    expect(inspect('ghost + 1')).toEqual({ kind: 'invalid', message: 'ghost is not defined: give it as a value or define it in an expression above' });
    expect(inspect('later + 1')).toEqual({ kind: 'invalid', message: 'later is defined further down (expression 5); define it before it is used' });
  });
});
