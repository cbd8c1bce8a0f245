import type { DesignDefinition, TestRun } from '@limitbook/contracts';
import { EngineError, type EngineErrorCode } from '../core/engine-error.js';
import { checkMethodDesign, type DesignCheckReport } from './check-method-design.js';
import { evaluateMethodDesign, type DesignEvaluation, type DesignValues } from './evaluate-method-design.js';
import { runDesignTests } from './run-design-tests.js';

/** Work on a design that crosses into an evaluation worker: plain data in and out. */
export type DesignTask =
  | { kind: 'evaluate'; definition: DesignDefinition; values: DesignValues }
  | { kind: 'check'; definition: DesignDefinition }
  | { kind: 'tests'; definition: DesignDefinition };

export type DesignTaskOutcome =
  | { ok: true; kind: 'evaluate'; evaluation: DesignEvaluation }
  | { ok: true; kind: 'check'; check: DesignCheckReport }
  | { ok: true; kind: 'tests'; run: TestRun }
  | { ok: false; code: EngineErrorCode; message: string; fields: Record<string, string> };

export function runDesignTask(task: DesignTask): DesignTaskOutcome {
  try {
    switch (task.kind) {
      case 'evaluate':
        return { ok: true, kind: 'evaluate', evaluation: evaluateMethodDesign(task.definition, task.values) };
      case 'check':
        return { ok: true, kind: 'check', check: checkMethodDesign(task.definition) };
      case 'tests':
        return { ok: true, kind: 'tests', run: runDesignTests(task.definition) };
    }
  } catch (error) {
    if (error instanceof EngineError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    // Whatever mathjs throws that the checks above did not foresee is the definition's problem, never a server error.
    const message = `The method cannot be evaluated: ${error instanceof Error ? error.message : String(error)}`;
    return { ok: false, code: 'INVALID_INPUT', message, fields: { outputs: message } };
  }
}
