import type { DesignDefinition } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';
import { designExpressions } from './design-field-paths.js';
import { evaluateMethodDesign } from './evaluate-method-design.js';
import { expressionTex } from './expression-tex.js';

export interface DesignCheckReport {
  /** Messages per field of the definition; empty when the design evaluates with its defaults (or sample values). */
  problems: Record<string, string>;
  /** The sandbox refused an expression (a hostile or out-of-bounds construct). */
  refused: boolean;
  /** LaTeX of every expression that parses and was not refused. */
  tex: Record<string, string>;
}

/**
 * Checks a design as it is being written: static problems, then an evaluation with the
 * defaults (sample values where none) to find undefined names and unit mismatches. Nothing the
 * sandbox refuses is ever evaluated.
 */
export function checkMethodDesign(definition: DesignDefinition): DesignCheckReport {
  let problems: Record<string, string> = {};
  let refused = false;
  try {
    evaluateMethodDesign(definition, {}, { sampleMissing: true });
  } catch (error) {
    if (!(error instanceof EngineError)) throw error;
    refused = error.code === 'FORMULA_REFUSED' || error.code === 'LIMIT_EXCEEDED';
    problems = Object.fromEntries(Object.entries(error.fields).map(([field, message]) => [sampleField(field, definition), message]));
  }
  const refusedFields = new Set(Object.entries(problems).filter(([, message]) => message.startsWith('Refused')).map(([field]) => field));
  return { problems, refused, tex: expressionTex(designExpressions(definition).filter(({ field }) => !refusedFields.has(field))) };
}

/** A sample value's problem belongs to the input's default. */
function sampleField(field: string, definition: DesignDefinition): string {
  if (!field.startsWith('values.')) return field;
  const index = definition.inputs.findIndex((input) => input.name === field.slice(7));
  return index >= 0 ? `inputs.${index}.default` : field;
}
