import { fieldMessages, type EvaluationResult, type LengthUnit, type MethodSummary } from '@limitbook/contracts';
import { z } from 'zod';
import { EngineError } from './core/engine-error.js';
import type { EvaluationContext, MethodDefinition } from './core/method.js';
import { featureBoundaryMethod } from './boundary/index.js';
import { wallThicknessMethod } from './wall/index.js';
import { fastenerFixedMethod, fastenerFloatingMethod } from './fastener/index.js';
import { iso286FitMethod } from './iso286/index.js';
import { iso2768AngularMethod, iso2768GeometricMethod, iso2768Method } from './iso2768/index.js';
import { formulaMethod } from './formula/index.js';
import { stack1dMethod } from './stack/index.js';
import { positionCheckMethod } from './position/index.js';

// Each concept folder exports its method definitions; add them here, one line per method.
export const builtInMethods: readonly MethodDefinition[] = [
  featureBoundaryMethod,
  wallThicknessMethod,
  fastenerFloatingMethod,
  fastenerFixedMethod,
  iso286FitMethod,
  iso2768Method,
  iso2768AngularMethod,
  iso2768GeometricMethod,
  stack1dMethod,
  positionCheckMethod,
  formulaMethod,
] as const;

const byId = new Map(builtInMethods.map((method) => [method.id, method]));

export function findMethod(id: string): MethodDefinition | undefined {
  return byId.get(id);
}

export function describeMethod(method: MethodDefinition): MethodSummary {
  return {
    id: method.id,
    version: method.version,
    title: method.title,
    description: method.description,
    references: method.references,
    cautions: method.cautions,
    inputSchema: z.toJSONSchema(method.inputSchema, { io: 'input', unrepresentable: 'any' }) as Record<string, unknown>,
    outputs: method.outputs,
  };
}

/** Validates raw inputs against the method's schema and evaluates; throws EngineError with field messages. */
export function evaluateMethod(
  method: MethodDefinition,
  rawInputs: unknown,
  unit: LengthUnit,
  context: Omit<EvaluationContext, 'unit'> = {},
): EvaluationResult {
  const parsed = method.inputSchema.safeParse(rawInputs);
  if (!parsed.success) throw EngineError.invalid(prefixFields(fieldMessages(parsed.error), 'inputs'));
  try {
    const result = method.evaluate(parsed.data, { ...context, unit });
    return {
      method: method.id,
      version: method.version,
      unit,
      outputs: result.outputs as Record<string, unknown>,
      ...(result.verdict ? { verdict: result.verdict } : {}),
      warnings: result.warnings,
      steps: result.steps,
    };
  } catch (error) {
    if (error instanceof EngineError) {
      throw new EngineError(error.code, error.message, prefixFields(error.fields, 'inputs'));
    }
    throw error;
  }
}

function prefixFields(fields: Record<string, string>, prefix: string): Record<string, string> {
  return Object.fromEntries(Object.entries(fields).map(([key, message]) => [key === '_' ? prefix : `${prefix}.${key}`, message]));
}
