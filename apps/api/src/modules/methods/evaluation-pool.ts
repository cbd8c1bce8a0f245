import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { WorkerEvaluation, WorkerOutcome } from './evaluation-job.js';

export interface EvaluationPoolOptions {
  maxThreads?: number;
  maxQueue?: number;
}

/**
 * Locates the worker script: beside the bundle in production (dist/evaluation.worker.js), or the
 * TypeScript source under vitest/dev, loaded through tsx.
 */
function workerLocation(): { filename: string; execArgv: string[] } {
  const here = dirname(fileURLToPath(import.meta.url));
  const built = join(here, 'evaluation.worker.js');
  if (existsSync(built)) return { filename: built, execArgv: [] };
  const source = join(here, 'evaluation.worker.ts');
  if (existsSync(source)) return { filename: source, execArgv: ['--import', 'tsx'] };
  throw new Error(`Evaluation worker not found beside ${here}`);
}

export class EvaluationPool {
  private readonly pool: Piscina;

  constructor(options: EvaluationPoolOptions = {}) {
    const { filename, execArgv } = workerLocation();
    this.pool = new Piscina({
      filename,
      execArgv,
      minThreads: 0,
      maxThreads: options.maxThreads ?? Math.max(1, availableParallelism() - 1),
      maxQueue: options.maxQueue ?? 256,
      idleTimeout: 30_000,
    });
  }

  /** Rejects with an AbortError when `timeoutMs` passes; piscina then terminates that worker. */
  run(job: WorkerEvaluation, timeoutMs: number): Promise<WorkerOutcome> {
    return this.pool.run(job, { signal: AbortSignal.timeout(timeoutMs) }) as Promise<WorkerOutcome>;
  }

  get queueSize(): number {
    return this.pool.queueSize;
  }

  async close(): Promise<void> {
    await this.pool.close({ force: true });
  }
}
