import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { limitbookSchema } from './limitbook-schema.js';
import { markAttributeSchemas, nodeAttributeSchemas } from './attribute-schemas.js';

function shapeKeys(schema: z.ZodType | undefined): string[] {
  return Object.keys((schema as z.ZodObject | undefined)?.shape ?? {}).sort();
}

describe('attribute rules', () => {
  const schema = limitbookSchema();

  it('exist for exactly the attributes of every node type', () => {
    for (const [name, type] of Object.entries(schema.nodes)) {
      expect({ name, keys: shapeKeys(nodeAttributeSchemas[name]) }).toEqual({ name, keys: Object.keys(type.spec.attrs ?? {}).sort() });
    }
    expect(Object.keys(nodeAttributeSchemas).sort()).toEqual(Object.keys(schema.nodes).sort());
  });

  it('exist for exactly the attributes of every mark type', () => {
    for (const [name, type] of Object.entries(schema.marks)) {
      expect({ name, keys: shapeKeys(markAttributeSchemas[name]) }).toEqual({ name, keys: Object.keys(type.spec.attrs ?? {}).sort() });
    }
    expect(Object.keys(markAttributeSchemas).sort()).toEqual(Object.keys(schema.marks).sort());
  });
});
