import type { DerivationStep, LengthUnit, OutputDescription, Verdict } from '@limitbook/contracts';
import type { z } from 'zod';

export interface EvaluationContext {
  unit: LengthUnit;
  /** Source of uniform randoms in [0, 1); methods that sample take it from here so callers control seeding. */
  random?: () => number;
}

export interface MethodResult<TOutputs> {
  outputs: TOutputs;
  verdict?: Verdict;
  warnings: string[];
  steps: DerivationStep[];
}

/**
 * A published or in-house method. `version` is bumped whenever any result can change,
 * so a saved record can say exactly which method produced it.
 */
export interface MethodDefinition<TSchema extends z.ZodType = z.ZodType, TOutputs = Record<string, unknown>> {
  id: string;
  version: number;
  title: string;
  description: string;
  references: string[];
  cautions: string[];
  inputSchema: TSchema;
  outputs: OutputDescription[];
  evaluate(inputs: z.output<TSchema>, context: EvaluationContext): MethodResult<TOutputs>;
}

export function defineMethod<TSchema extends z.ZodType, TOutputs>(
  method: MethodDefinition<TSchema, TOutputs>,
): MethodDefinition<TSchema, TOutputs> {
  return method;
}
