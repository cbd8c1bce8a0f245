export type EngineErrorCode =
  /** An input is out of range or inconsistent (lower limit above upper limit, negative tolerance). */
  | 'INVALID_INPUT'
  /** The published standard does not define this combination (a fit letter/grade/size it does not tabulate). */
  | 'NOT_DEFINED_BY_STANDARD'
  /** A formula method used something the sandbox refuses. */
  | 'FORMULA_REFUSED'
  /** A request exceeds a size or time limit (trial count, matrix size, evaluation time). */
  | 'LIMIT_EXCEEDED'
  | 'UNKNOWN_METHOD';

/** A typed error from a method: one message per offending input, keyed by its dotted path. */
export class EngineError extends Error {
  constructor(
    readonly code: EngineErrorCode,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'EngineError';
  }

  static invalid(fields: Record<string, string>): EngineError {
    const [first] = Object.values(fields);
    return new EngineError('INVALID_INPUT', first ?? 'Invalid input', fields);
  }
}
