import { Injectable, OnModuleDestroy } from '@nestjs/common';
import {
  houseMethodPrefix,
  isHouseMethodId,
  type AcceptanceRule,
  type BatchEvaluateResponse,
  type DesignDefinition,
  type EvaluationResult,
  type LengthUnit,
  type MethodSummary,
} from '@limitbook/contracts';
import {
  EngineError,
  builtInMethods,
  describeMethod,
  describeMethodDesign,
  evaluateMethod,
  findMethod,
  judgeAcceptance,
  type DesignTask,
  type DesignTaskOutcome,
} from '@limitbook/engine';
import { MethodDesignsRepository } from '../method-designs/method-designs.repository.js';
import type { WorkerEvaluation, WorkerOutcome } from './evaluation-job.js';
import { EvaluationPool } from './evaluation-pool.js';
import { MethodEvaluationException } from './methods.exception.js';

/**
 * Methods whose work grows with their inputs (sampling, user formulas) run in worker threads
 * with a time limit; closed-form methods run inline, where a thread hop would cost more than they do.
 */
const workerTimeLimitMs: ReadonlyMap<string, number> = new Map([
  ['stack-1d', 60_000],
  ['formula', 5_000],
  // A few ms for a flange pattern, but up to ~0.7 s for 500 features that all bound the group shift.
  ['position-check', 10_000],
]);

/** In-house methods and the designer's previews, checks and test runs: the formula sandbox's limit. */
const designTimeLimitMs = 5_000;

export interface EvaluationItem {
  method: string;
  inputs: unknown;
  unit: LengthUnit;
  acceptance?: AcceptanceRule | undefined;
  /** In-house methods: the released version to evaluate; null or absent = the latest release. */
  methodVersion?: number | null | undefined;
}

@Injectable()
export class MethodsService implements OnModuleDestroy {
  private readonly catalog: MethodSummary[] = builtInMethods.map((method) => ({ ...describeMethod(method), source: 'built-in' as const }));
  private pool: EvaluationPool | undefined;

  constructor(private readonly designs: MethodDesignsRepository) {}

  /** Built-in methods, then the latest release of every in-house method. */
  async listMethods(): Promise<MethodSummary[]> {
    const released = await this.designs.allReleased();
    return [...this.catalog, ...released.map(({ design, revision }) => describeMethodDesign(`${houseMethodPrefix}${design.slug}`, revision.methodVersion!, revision.definition))];
  }

  async getMethod(id: string, methodVersion: number | null = null): Promise<MethodSummary> {
    if (isHouseMethodId(id)) {
      const { version, definition } = await this.houseMethod(id, methodVersion);
      return describeMethodDesign(id, version, definition);
    }
    const method = this.catalog.find((entry) => entry.id === id);
    if (!method) throw MethodEvaluationException.unknownMethod(id);
    return method;
  }

  /** The latest version of a method: the engine's for built-ins, the latest release for in-house ones; undefined when unknown. */
  async latestVersion(id: string): Promise<number | undefined> {
    if (isHouseMethodId(id)) return (await this.designs.findReleasedBySlug(id.slice(houseMethodPrefix.length), null))?.revision.methodVersion ?? undefined;
    return this.catalog.find((entry) => entry.id === id)?.version;
  }

  /** A released in-house method at a version (null: the latest); 404 when the method or version does not exist. */
  async houseMethod(id: string, methodVersion: number | null): Promise<{ version: number; definition: DesignDefinition }> {
    const found = await this.designs.findReleasedBySlug(id.slice(houseMethodPrefix.length), methodVersion);
    if (!found) throw methodVersion === null ? MethodEvaluationException.unknownMethod(id) : MethodEvaluationException.unknownVersion(id, methodVersion);
    return { version: found.revision.methodVersion!, definition: found.revision.definition };
  }

  /**
   * Runs a design task (evaluate, check, test table) in a worker with the formula sandbox's
   * time limit; a runaway task is stopped and answered with a 400.
   */
  async runDesignTask(task: DesignTask, label: string): Promise<DesignTaskOutcome> {
    const outcome = await this.runJob({ method: label, inputs: {}, unit: 'mm', design: task }, label, designTimeLimitMs);
    if ('design' in outcome) return outcome.design;
    throw new Error('The evaluation worker answered a design task with a method result');
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
    if (isHouseMethodId(item.method)) return this.evaluateHouseMethod(item);
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
    const outcome = await this.runJob({ method: item.method, inputs: item.inputs, unit: item.unit }, item.method, timeLimit);
    if (!outcome.ok) throw MethodEvaluationException.fromEngine(outcome.code, outcome.message, outcome.fields);
    if ('result' in outcome) return outcome.result;
    throw new Error('The evaluation worker answered a method with a design outcome');
  }

  /** Inputs of an in-house method are numbers in each input's unit (or quantities with a unit); the length unit does not apply. */
  private async evaluateHouseMethod(item: EvaluationItem): Promise<EvaluationResult> {
    const { version, definition } = await this.houseMethod(item.method, item.methodVersion ?? null);
    const values = houseValues(item.inputs);
    if ('problem' in values) throw MethodEvaluationException.fromEngine('INVALID_INPUT', values.problem, values.fields);
    const outcome = await this.runDesignTask({ kind: 'evaluate', definition, values: values.values }, item.method);
    if (!outcome.ok) {
      // Errors in the method's own formulas are the designer's; readers see them as one message.
      const fields = Object.fromEntries(Object.entries(outcome.fields).map(([key, message]) => [key.startsWith('values.') ? `inputs.${key.slice(7)}` : 'inputs', message]));
      throw MethodEvaluationException.fromEngine(outcome.code, outcome.message, fields);
    }
    if (outcome.kind !== 'evaluate') throw new Error('Unexpected design outcome');
    const { outputs, verdict, warnings, steps } = outcome.evaluation;
    return { method: item.method, version, unit: item.unit, outputs, ...(verdict ? { verdict } : {}), warnings, steps };
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

  private async runJob(job: WorkerEvaluation, label: string, timeLimitMs: number): Promise<WorkerOutcome> {
    this.pool ??= new EvaluationPool();
    try {
      return await this.pool.run(job, timeLimitMs);
    } catch (error) {
      if (error instanceof Error && (error.name === 'AbortError' || error.name === 'TimeoutError')) {
        throw MethodEvaluationException.timedOut(label, timeLimitMs);
      }
      if (error instanceof Error && /queue is full/i.test(error.message)) throw MethodEvaluationException.busy();
      throw error;
    }
  }
}

/** An in-house method's inputs: name → number (in the input's unit) or text with a unit. */
function houseValues(inputs: unknown): { values: Record<string, number | string> } | { problem: string; fields: Record<string, string> } {
  const values: Record<string, number | string> = {};
  const fields: Record<string, string> = {};
  for (const [name, value] of Object.entries((inputs ?? {}) as Record<string, unknown>)) {
    if (value === null || value === undefined || value === '') continue;
    if ((typeof value === 'number' && Number.isFinite(value)) || (typeof value === 'string' && value.length <= 100)) values[name] = value;
    else fields[`inputs.${name}`] = 'A value is a number in the input unit, or a quantity such as "2.8 mm"';
  }
  return Object.keys(fields).length > 0 ? { problem: Object.values(fields)[0]!, fields } : { values };
}
