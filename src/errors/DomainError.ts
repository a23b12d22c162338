/**
 * Codes a domain operation can fail with. The API turns each code into one HTTP status in
 * a single place (app.onError), so the core never knows about HTTP.
 */
export type DomainErrorCode =
  | 'invalid_input'
  | 'implausible_value'
  | 'not_found'
  | 'conflict'
  | 'precondition_failed'
  | 'unauthorized'
  | 'forbidden'
  | 'payload_too_large'
  | 'rate_limited'
  | 'unavailable';

/** One offending field: a JSON-pointer-like path (or CSV row and column) and what is wrong. */
export interface FieldProblem {
  field: string;
  message: string;
  row?: number;
}

/**
 * The one error type of the domain. Bad input is never a silent NaN: it is this error.
 *
 * @example
 * throw new DomainError('invalid_input', 'thicknessMm must be positive', [
 *   { field: 'thicknessMm', message: 'must be > 0, got -3' },
 * ]);
 */
export class DomainError extends Error {
  readonly code: DomainErrorCode;
  readonly problems: FieldProblem[];

  constructor(code: DomainErrorCode, message: string, problems: FieldProblem[] = []) {
    super(message);
    this.name = 'DomainError';
    this.code = code;
    this.problems = problems;
  }
}
