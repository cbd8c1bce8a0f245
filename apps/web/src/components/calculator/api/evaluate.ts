import {
  batchEvaluateResponseSchema,
  evaluationResultSchema,
  maxBatchItems,
  type AcceptanceRule,
  type ErrorBody,
  type EvaluationResult,
  type LengthUnit,
} from '@limitbook/contracts';
import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';

/** What the server is asked to evaluate for one calculator block. */
export type EvaluationRequest = {
  method: string;
  inputs: Record<string, unknown>;
  unit: LengthUnit;
  acceptance?: AcceptanceRule | null;
  /** In-house methods: the released version a block is pinned to; absent or null runs the latest release. */
  methodVersion?: number | null;
};

/** The server's answer for one block: a result, or the error it gave (with its field messages). */
export type EvaluationOutcome = { ok: true; result: EvaluationResult } | { ok: false; error: ErrorBody };

function stable(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stable).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, item]) => item !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([key, item]) => `${JSON.stringify(key)}:${stable(item)}`).join(',')}}`;
  }
  return JSON.stringify(value ?? null);
}

/** Equal requests get equal keys whatever the order of their properties. */
export function evaluationKey(request: EvaluationRequest): string {
  return stable({ method: request.method, unit: request.unit, inputs: request.inputs, acceptance: request.acceptance ?? null, methodVersion: request.methodVersion ?? undefined });
}

/** The request an `evaluationKey` was made from. */
export function requestFromKey(key: string): EvaluationRequest {
  const parsed = JSON.parse(key) as { method: string; unit: EvaluationRequest['unit']; inputs: Record<string, unknown>; acceptance: EvaluationRequest['acceptance']; methodVersion?: number };
  return { method: parsed.method, unit: parsed.unit, inputs: parsed.inputs, acceptance: parsed.acceptance ?? null, methodVersion: parsed.methodVersion ?? null };
}

function body(request: EvaluationRequest) {
  return {
    inputs: request.inputs,
    unit: request.unit,
    ...(request.acceptance ? { acceptance: request.acceptance } : {}),
    ...(request.methodVersion != null ? { methodVersion: request.methodVersion } : {}),
  };
}

/** Evaluates one block; the server's refusals (bad inputs, undefined fits…) come back as outcomes, not throws. */
export async function evaluateOne(request: EvaluationRequest, signal?: AbortSignal): Promise<EvaluationOutcome> {
  try {
    const result = await api.post(`/api/methods/${encodeURIComponent(request.method)}/evaluate`, body(request), evaluationResultSchema, { signal });
    return { ok: true, result };
  } catch (error) {
    if (isApiError(error) && error.status >= 400 && error.status < 500 && error.status !== 401 && error.status !== 429) return { ok: false, error: error.body };
    throw error;
  }
}

/** Evaluates many blocks in as few round trips as the server allows (one for any page of ordinary size). */
export async function evaluateBatch(requests: EvaluationRequest[], signal?: AbortSignal): Promise<EvaluationOutcome[]> {
  const outcomes: EvaluationOutcome[] = [];
  for (let start = 0; start < requests.length; start += maxBatchItems) {
    const chunk = requests.slice(start, start + maxBatchItems);
    const response = await api.post(
      '/api/evaluate',
      { items: chunk.map((request) => ({ method: request.method, ...body(request) })) },
      batchEvaluateResponseSchema,
      { signal },
    );
    outcomes.push(...response.results);
  }
  return outcomes;
}

export const evaluationQueryOptions = (request: EvaluationRequest) =>
  queryOptions({
    queryKey: ['evaluation', evaluationKey(request)],
    queryFn: ({ signal }) => evaluateOne(request, signal),
    // The same inputs to the same released method give the same answer.
    staleTime: Infinity,
    gcTime: 10 * 60_000,
    retry: false,
  });

/** Puts a batch's answers where each block's own evaluation looks first, so no block asks again. */
export function seedEvaluations(queryClient: QueryClient, requests: EvaluationRequest[], outcomes: EvaluationOutcome[]) {
  requests.forEach((request, index) => {
    const outcome = outcomes[index];
    if (outcome) queryClient.setQueryData(evaluationQueryOptions(request).queryKey, outcome);
  });
}
