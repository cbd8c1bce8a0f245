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
  private warm: Promise<void> | undefined;

  constructor(options: EvaluationPoolOptions = {}) {
    const { filename, execArgv } = workerLocation();
    this.pool = new Piscina({
      filename,
      execArgv,
      // One thread stays loaded so a request never pays for starting a worker and loading mathjs.
      minThreads: 1,
      maxThreads: options.maxThreads ?? Math.max(1, availableParallelism() - 1),
      maxQueue: options.maxQueue ?? 256,
      idleTimeout: 30_000,
    });
  }

  /**
   * Rejects with an AbortError when `timeoutMs` passes; piscina then terminates that worker.
   * The first call waits for a worker to load before the clock starts, so a cold start is not
   * mistaken for a runaway evaluation.
   */
  async run(job: WorkerEvaluation, timeoutMs: number): Promise<WorkerOutcome> {
    await this.warmUp();
    return (await this.pool.run(job, { signal: AbortSignal.timeout(timeoutMs) })) as WorkerOutcome;
  }

  /** Loads a worker (and the engine in it) by running a job that returns at once. */
  warmUp(): Promise<void> {
    this.warm ??= this.pool.run({ method: '', inputs: {}, unit: 'mm' } satisfies WorkerEvaluation).then(() => undefined);
    return this.warm;
  }

  get queueSize(): number {
    return this.pool.queueSize;
  }

  async close(): Promise<void> {
    await this.pool.close({ force: true });
  }
}
