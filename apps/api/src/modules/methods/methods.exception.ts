import type { EngineErrorCode } from '@limitbook/engine';
import { AppException } from '../../common/errors/app.exception.js';

const leadByEngineCode: Record<Exclude<EngineErrorCode, 'UNKNOWN_METHOD'>, string> = {
  INVALID_INPUT: 'Some inputs are not valid for this method.',
  NOT_DEFINED_BY_STANDARD: 'The standard does not define this combination.',
  FORMULA_REFUSED: 'A formula uses something the evaluator does not allow.',
  LIMIT_EXCEEDED: 'The request exceeds a limit of the evaluator.',
};

/** Engine refusals become 400s carrying the engine's per-field messages, so the web app can show them at the field. */
export class MethodEvaluationException extends AppException {
  static unknownMethod(id: string): MethodEvaluationException {
    return new MethodEvaluationException(404, 'NOT_FOUND', `No method with id "${id}".`, { method: 'Unknown method' });
  }

  static unknownVersion(id: string, version: number): MethodEvaluationException {
    return new MethodEvaluationException(404, 'NOT_FOUND', `Method "${id}" has no released version ${version}.`, { methodVersion: `No released version ${version}` });
  }

  static fromEngine(code: EngineErrorCode, message: string, fields: Record<string, string>): MethodEvaluationException {
    if (code === 'UNKNOWN_METHOD') return new MethodEvaluationException(404, 'NOT_FOUND', message, { method: 'Unknown method' });
    const hasFields = Object.keys(fields).length > 0;
    return new MethodEvaluationException(400, 'VALIDATION_FAILED', hasFields ? leadByEngineCode[code] : message, hasFields ? fields : { inputs: message });
  }

  static timedOut(method: string, limitMs: number): MethodEvaluationException {
    return new MethodEvaluationException(400, 'VALIDATION_FAILED', `Evaluating "${method}" took longer than ${limitMs / 1000} s and was stopped.`, {
      inputs: 'Evaluation took too long; reduce the work (fewer trials, simpler formulas)',
    });
  }

  static busy(): MethodEvaluationException {
    return new MethodEvaluationException(429, 'RATE_LIMITED', 'The server is busy evaluating other requests. Try again in a moment.');
  }
}
