import { EngineError, evaluateMethod, findMethod, runDesignTask } from '@limitbook/engine';
import type { WorkerEvaluation, WorkerOutcome } from './evaluation-job.js';

// Runs in a worker thread (piscina): heavy or open-ended methods never block the event loop,
// and a worker stuck past its time limit can be terminated.
export default function evaluateInWorker(job: WorkerEvaluation): WorkerOutcome {
  if (job.design) return { ok: true, design: runDesignTask(job.design) };
  const method = findMethod(job.method);
  if (!method) return { ok: false, code: 'UNKNOWN_METHOD', message: `Unknown method "${job.method}"`, fields: {} };
  try {
    return { ok: true, result: evaluateMethod(method, job.inputs, job.unit) };
  } catch (error) {
    if (error instanceof EngineError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}
