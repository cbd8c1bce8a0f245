import type { EvaluationResult, LengthUnit } from '@limitbook/contracts';
import type { DesignTask, DesignTaskOutcome, EngineErrorCode } from '@limitbook/engine';

/** What crosses the thread boundary: plain data only (class identities do not survive structured clone). */
export interface WorkerEvaluation {
  method: string;
  inputs: unknown;
  unit: LengthUnit;
  /** In-house methods and the designer's previews: the design to evaluate, check or test, instead of a built-in method. */
  design?: DesignTask;
}

export type WorkerOutcome =
  | { ok: true; result: EvaluationResult }
  | { ok: false; code: EngineErrorCode; message: string; fields: Record<string, string> }
  | { ok: true; design: DesignTaskOutcome };
