import { safetyCaution, type DesignDefinition, type MethodSummary } from '@limitbook/contracts';
import { designInputSchema } from './design-input-schema.js';

/** A released in-house method as a catalog entry, like the built-ins' `describeMethod`. */
export function describeMethodDesign(id: string, version: number, definition: DesignDefinition): MethodSummary {
  return {
    id,
    version,
    source: 'in-house',
    title: definition.name,
    description: definition.description,
    references: definition.references,
    cautions: [...definition.cautions, ...(definition.safetyCritical ? [safetyCaution] : [])],
    inputSchema: designInputSchema(definition),
    outputs: definition.outputs.map((output) => ({
      name: output.name,
      label: output.label,
      kind: 'object',
      description: `{ value, unit, text } in ${output.unit || 'plain numbers'}, ${output.decimals} decimals shown`,
    })),
  };
}
