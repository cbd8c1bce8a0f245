import type { ErrorBody, EvaluationResult } from '@limitbook/contracts';
import type { EvaluationOutcome } from '../api/evaluate';

/**
 * - `loading`: nothing to show yet.
 * - `updating`: the inputs changed and the server has not answered for them; the result shown is for earlier inputs.
 * - `current`: the result shown is the server's answer for exactly the inputs on screen.
 * - `error`: the server refused the inputs on screen (or could not be reached); any result shown is out of date.
 */
export type EvaluationState = 'loading' | 'updating' | 'current' | 'error';

export type EvaluationView = {
  state: EvaluationState;
  /** The result to show: current only when `stale` is false. */
  result: EvaluationResult | null;
  stale: boolean;
  error: ErrorBody | null;
};

export type EvaluationSnapshot = {
  /** Key of the inputs on screen. */
  requestKey: string;
  /** Key of the inputs the last evaluation was asked for (lags behind while debouncing). */
  askedKey: string;
  /** Whether the evaluation for `askedKey` is running (or not yet allowed to run). */
  running: boolean;
  /** The server's answer for `askedKey`, once there is one. */
  outcome: EvaluationOutcome | undefined;
  /** A failure to get any answer (network, server error). */
  failure: ErrorBody | null;
  /** The last successful result, for whichever inputs it was. */
  lastGood: { key: string; result: EvaluationResult } | null;
};

/** Decides what a calculator block shows, so a result is never presented as current unless it is. */
export function deriveEvaluationView(snapshot: EvaluationSnapshot): EvaluationView {
  const { requestKey, askedKey, running, outcome, failure, lastGood } = snapshot;
  const settled = requestKey === askedKey && !running;
  const previous = lastGood?.result ?? null;

  if (settled && outcome?.ok) return { state: 'current', result: outcome.result, stale: false, error: null };
  if (settled && (outcome || failure)) {
    const error = outcome && !outcome.ok ? outcome.error : failure;
    return { state: 'error', result: previous, stale: previous !== null, error };
  }
  if (previous) return { state: 'updating', result: previous, stale: true, error: null };
  return { state: 'loading', result: null, stale: false, error: null };
}
