import type { DesignDefinition } from '@limitbook/contracts';

/** The formula set's field (`expressions.3`, `checks.0`) as a field of the design (`outputs.1.expression`, `checks.0.expression`). */
export function designFieldPath(field: string, definition: Pick<DesignDefinition, 'intermediates'>): string {
  const expression = /^expressions\.(\d+)$/.exec(field);
  if (expression) {
    const index = Number(expression[1]);
    const intermediates = definition.intermediates.length;
    return index < intermediates ? `intermediates.${index}.expression` : `outputs.${index - intermediates}.expression`;
  }
  const check = /^checks\.(\d+)$/.exec(field);
  if (check) return `checks.${check[1]}.expression`;
  return field;
}

/** Every expression of a design with its field, in evaluation order, checks last. */
export function designExpressions(definition: Pick<DesignDefinition, 'intermediates' | 'outputs' | 'checks'>): { field: string; expression: string }[] {
  return [
    ...definition.intermediates.map((entry, index) => ({ field: `intermediates.${index}.expression`, expression: entry.expression })),
    ...definition.outputs.map((entry, index) => ({ field: `outputs.${index}.expression`, expression: entry.expression })),
    ...definition.checks.map((entry, index) => ({ field: `checks.${index}.expression`, expression: entry.expression })),
  ];
}
