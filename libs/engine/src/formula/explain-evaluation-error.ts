import { isUnit, type MathNode } from 'mathjs';

const dimensionNames = ['mass', 'length', 'time', 'current', 'temperature', 'luminous intensity', 'amount of substance', 'angle', 'bit'];

/**
 * Turns mathjs' terse runtime error ("Units do not match") into a sentence naming the
 * operation that failed and what it was given. The failing operation is found by evaluating the
 * tree bottom-up: the first node whose operands evaluate but which itself throws.
 */
export function explainEvaluationError(root: MathNode, scope: Map<string, unknown>, error: unknown): string {
  const failing = findFailingNode(root, scope);
  const message = error instanceof Error ? error.message : String(error);
  if (!failing) return readable(message);
  const operands = failing.operands.map(describeOperand);
  const where = `In ${failing.node.toString()}`;
  if (/Units do not match/.test(failing.message)) return `${where}: units do not match (${operands.join(' and ')})`;
  if (/different base/.test(failing.message)) return `${where}: cannot compare ${operands.join(' with ')}`;
  if (/Unexpected type of argument/.test(failing.message)) return `${where}: cannot combine ${operands.join(' and ')}`;
  return `${where}: ${readable(failing.message)}`;
}

interface FailingNode {
  node: MathNode;
  operands: unknown[];
  message: string;
}

function findFailingNode(node: MathNode, scope: Map<string, unknown>): FailingNode | undefined {
  const operands = operandNodes(node);
  const values: unknown[] = [];
  for (const operand of operands) {
    const deeper = findFailingNode(operand, scope);
    if (deeper) return deeper;
    values.push(node.type === 'ConditionalNode' ? undefined : evaluate(operand, scope).value);
  }
  if (operands.length === 0) return undefined;
  const outcome = evaluate(node, scope);
  return outcome.error === undefined ? undefined : { node, operands: values, message: outcome.error };
}

function operandNodes(node: MathNode): MathNode[] {
  const shaped = node as unknown as { args?: MathNode[]; params?: MathNode[]; content?: MathNode; condition?: MathNode; trueExpr?: MathNode; falseExpr?: MathNode };
  if (shaped.args) return shaped.args;
  if (shaped.params) return shaped.params;
  if (shaped.content) return [shaped.content];
  if (shaped.condition && shaped.trueExpr && shaped.falseExpr) return [shaped.condition, shaped.trueExpr, shaped.falseExpr];
  return [];
}

function evaluate(node: MathNode, scope: Map<string, unknown>): { value?: unknown; error?: string } {
  try {
    return { value: node.compile().evaluate(new Map(scope)) };
  } catch (error) {
    return { error: error instanceof Error ? error.message : String(error) };
  }
}

function describeOperand(value: unknown): string {
  if (typeof value === 'number') return `the plain number ${value}`;
  if (typeof value === 'boolean') return `the truth value ${value}`;
  if (isUnit(value)) {
    const dimensions = (value as unknown as { dimensions: number[] }).dimensions;
    const single = dimensions.filter((power) => power !== 0);
    const kind = single.length === 1 && single[0] === 1 ? ` (${dimensionNames[dimensions.findIndex((power) => power !== 0)]})` : '';
    return `a quantity in ${value.formatUnits() || 'no unit'}${kind}`;
  }
  return 'a value of another kind';
}

function readable(message: string): string {
  const typed = /Unexpected type of argument in function (\w+) \(expected: ([\w ]+), actual: (\w+)/.exec(message);
  if (typed) return `${typed[1]} expected a ${typed[2]} but was given a ${typed[3]}`;
  return message.replace(/\s*\(char \d+\)$/, '');
}
