import type { DesignDefinition } from '@limitbook/contracts';

/**
 * The inputs as JSON Schema for the calculator form: a number per input with its label as
 * `title`, help and unit in `description`, the range as minimum/maximum, and the unit again
 * as `x-unit` for forms that show it beside the field.
 */
export function designInputSchema(definition: DesignDefinition): Record<string, unknown> {
  const properties: Record<string, unknown> = {};
  for (const input of definition.inputs) {
    const unitNote = input.unit === '' ? '' : ` [${input.unit}]`;
    properties[input.name] = {
      type: 'number',
      title: input.label,
      description: `${input.help || input.label}${unitNote}`,
      ...(input.default !== null ? { default: input.default } : {}),
      ...(input.min !== null ? { minimum: input.min } : {}),
      ...(input.max !== null ? { maximum: input.max } : {}),
      'x-unit': input.unit,
      'x-kind': input.kind,
    };
  }
  return {
    $schema: 'http://json-schema.org/draft-07/schema#',
    type: 'object',
    properties,
    required: definition.inputs.filter((input) => input.default === null).map((input) => input.name),
    additionalProperties: false,
  };
}
