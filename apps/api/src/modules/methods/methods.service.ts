import { Injectable, OnModuleDestroy } from '@nestjs/common';
import type { AcceptanceRule, BatchEvaluateResponse, EvaluationResult, LengthUnit, MethodSummary } from '@limitbook/contracts';
import { EngineError, builtInMethods, describeMethod, evaluateMethod, findMethod, judgeAcceptance } from '@limitbook/engine';
import { EvaluationPool } from './evaluation-pool.js';
import { MethodEvaluationException } from './methods.exception.js';

/**
 * Methods whose work grows with their inputs (sampling, user formulas) run in worker threads
 * with a time limit; closed-form methods run inline, where a thread hop would cost more than they do.
 */
const workerTimeLimitMs: ReadonlyMap<string, number> = new Map([
  ['stack-1d', 60_000],
  ['formula', 5_000],
]);

export interface EvaluationItem {
  method: string;
  inputs: unknown;
  unit: LengthUnit;
  acceptance?: AcceptanceRule | undefined;
}

@Injectable()
export class MethodsService implements OnModuleDestroy {
  private readonly catalog: MethodSummary[] = builtInMethods.map(describeMethod);
  private pool: EvaluationPool | undefined;

  listMethods(): MethodSummary[] {
    return this.catalog;
  }

  getMethod(id: string): MethodSummary {
    const method = this.catalog.find((entry) => entry.id === id);
    if (!method) throw MethodEvaluationException.unknownMethod(id);
    return method;
  }

  /** Evaluates a method and, when the item carries a calculator block's acceptance rule, judges it. */
  async evaluate(item: EvaluationItem): Promise<EvaluationResult> {
    const result = await this.evaluateMethod(item);
    if (!item.acceptance) return result;
    try {
      return judgeAcceptance(result, item.acceptance);
    } catch (error) {
      if (error instanceof EngineError) throw MethodEvaluationException.fromEngine(error.code, error.message, { 'acceptance.output': error.message });
      throw error;
    }
  }

  private async evaluateMethod(item: EvaluationItem): Promise<EvaluationResult> {
    const method = findMethod(item.method);
    if (!method) throw MethodEvaluationException.unknownMethod(item.method);
    const timeLimit = workerTimeLimitMs.get(method.id);
    if (timeLimit === undefined) {
      try {
        return evaluateMethod(method, item.inputs, item.unit);
      } catch (error) {
        if (error instanceof EngineError) throw MethodEvaluationException.fromEngine(error.code, error.message, error.fields);
        throw error;
      }
    }
    const outcome = await this.runInWorker(item, timeLimit);
    if (outcome.ok) return outcome.result;
    throw MethodEvaluationException.fromEngine(outcome.code, outcome.message, outcome.fields);
  }

  /** Every item gets its own success or error; one bad block never fails the page. */
  async evaluateBatch(items: EvaluationItem[]): Promise<BatchEvaluateResponse> {
    const results = await Promise.all(
      items.map(async (item) => {
        try {
          return { ok: true as const, result: await this.evaluate(item) };
        } catch (error) {
          if (error instanceof MethodEvaluationException) return { ok: false as const, error: error.body };
          throw error;
        }
      }),
    );
    return { results };
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool?.close();
  }

  private async runInWorker(item: EvaluationItem, timeLimitMs: number) {
    this.pool ??= new EvaluationPool();
    try {
      return await this.pool.run({ method: item.method, inputs: item.inputs, unit: item.unit }, timeLimitMs);
    } catch (error) {
      if (error instanceof Error && (error.name === 'AbortError' || error.name === 'TimeoutError')) {
        throw MethodEvaluationException.timedOut(item.method, timeLimitMs);
      }
      if (error instanceof Error && /queue is full/i.test(error.message)) throw MethodEvaluationException.busy();
      throw error;
    }
  }
}
