import type { EvaluationResult, LengthUnit } from '@limitbook/contracts';
import type { EngineErrorCode } from '@limitbook/engine';

/** What crosses the thread boundary: plain data only (class identities do not survive structured clone). */
export interface WorkerEvaluation {
  method: string;
  inputs: unknown;
  unit: LengthUnit;
}

export type WorkerOutcome =
  | { ok: true; result: EvaluationResult }
  | { ok: false; code: EngineErrorCode; message: string; fields: Record<string, string> };
