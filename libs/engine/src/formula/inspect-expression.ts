import type { MathNode } from 'mathjs';
import { allowedConstants, allowedFunctions, allowedOperators } from './formula-allow-list.js';

export interface ExpressionProblem {
  /** `refused`: the sandbox does not allow it; `invalid`: a mistake such as an undefined name. */
  kind: 'refused' | 'invalid';
  message: string;
}

export interface InspectionScope {
  /** Names with a value at this point (inputs and earlier results). */
  isDefined(name: string): boolean;
  /** Where a name is defined further down, to say so instead of "undefined". */
  definedLaterAt(name: string): number | undefined;
  isUnit(name: string): boolean;
  /** Index of the expression being inspected (checks come after every expression). */
  position: number;
}

export interface InspectionLimits {
  maxNodes: number;
  maxTreeDepth: number;
}

/**
 * Walks a parsed expression against the allow-list: numbers, names with a value, units,
 * pi/e/tau, parentheses, allowed operators and named calls of allowed functions, and the
 * conditional `a ? b : c`. Everything else (assignment, function definition, property or index
 * access, matrices, ranges, objects, text, blocks) is refused, which keeps evaluation a single
 * pass over at most `maxNodes` nodes with no loops, recursion or allocation beyond scalars.
 * Returns the first problem, or the names the expression refers to.
 */
export function inspectExpression(root: MathNode, scope: InspectionScope, limits: InspectionLimits): ExpressionProblem | { references: Set<string> } {
  const references = new Set<string>();
  let nodes = 0;

  const visit = (node: MathNode, depth: number): ExpressionProblem | undefined => {
    nodes += 1;
    if (nodes > limits.maxNodes) return refused(`it has more than ${limits.maxNodes} terms`);
    if (depth > limits.maxTreeDepth) return refused(`it nests deeper than ${limits.maxTreeDepth} levels`);
    const children = (list: readonly MathNode[]) => {
      for (const child of list) {
        const problem = visit(child, depth + 1);
        if (problem) return problem;
      }
      return undefined;
    };
    switch (node.type) {
      case 'ConstantNode': {
        const value: unknown = (node as unknown as { value: unknown }).value;
        if (typeof value === 'number' || typeof value === 'boolean') return undefined;
        if (typeof value === 'string') return refused('text in quotes is not allowed (write a quantity as 12 mm, without quotes)');
        return refused(`the constant ${String(value)} is not allowed`);
      }
      case 'SymbolNode':
        return checkSymbol((node as unknown as { name: string }).name);
      case 'ParenthesisNode':
        return children([(node as unknown as { content: MathNode }).content]);
      case 'OperatorNode': {
        const operator = node as unknown as { fn: string; op: string; args: MathNode[] };
        if (!allowedOperators.has(operator.fn)) return refused(`the operator ${operator.op} is not allowed`);
        return children(operator.args);
      }
      case 'RelationalNode': {
        const relation = node as unknown as { conditionals: string[]; params: MathNode[] };
        const disallowed = relation.conditionals.find((name) => !allowedOperators.has(name));
        if (disallowed) return refused(`the comparison ${disallowed} is not allowed`);
        return children(relation.params);
      }
      case 'ConditionalNode': {
        const conditional = node as unknown as { condition: MathNode; trueExpr: MathNode; falseExpr: MathNode };
        return children([conditional.condition, conditional.trueExpr, conditional.falseExpr]);
      }
      case 'FunctionNode': {
        const call = node as unknown as { fn: MathNode; args: MathNode[] };
        if (call.fn.type !== 'SymbolNode') return refused('only named functions can be called (no property access or computed calls)');
        const name = (call.fn as unknown as { name: string }).name;
        if (!allowedFunctions.has(name)) {
          return refused(`${name}() is not an allowed function; allowed: ${[...allowedFunctions].join(', ')}`);
        }
        return children(call.args);
      }
      case 'AssignmentNode':
        return refused('assignment is allowed only once, at the start: name = expression');
      case 'FunctionAssignmentNode':
        return refused('defining functions is not allowed');
      case 'AccessorNode':
      case 'IndexNode':
        return refused('property and index access are not allowed');
      case 'ArrayNode':
      case 'RangeNode':
        return refused('matrices, vectors and ranges are not allowed');
      case 'ObjectNode':
        return refused('objects are not allowed');
      case 'BlockNode':
        return refused('write one expression per line, without ; or line breaks');
      default:
        return refused(`${node.type} is not allowed`);
    }
  };

  const checkSymbol = (name: string): ExpressionProblem | undefined => {
    if (scope.isDefined(name)) {
      references.add(name);
      return undefined;
    }
    if (scope.isUnit(name) || allowedConstants.has(name)) return undefined;
    const later = scope.definedLaterAt(name);
    if (later !== undefined && later === scope.position) return { kind: 'invalid', message: `${name} cannot refer to itself` };
    if (later !== undefined) return { kind: 'invalid', message: `${name} is defined further down (expression ${later + 1}); define it before it is used` };
    if (allowedFunctions.has(name)) return refused(`${name} is a function: call it with arguments, ${name}(…)`);
    return { kind: 'invalid', message: `${name} is not defined: give it as a value or define it in an expression above` };
  };

  const problem = visit(root, 0);
  return problem ?? { references };
}

function refused(reason: string): ExpressionProblem {
  return { kind: 'refused', message: `Refused: ${reason}` };
}
