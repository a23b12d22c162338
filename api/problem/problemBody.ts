import type { FieldProblem } from '../../src/errors/DomainError.ts';

/** RFC 9457 problem details, with the per-field list this API adds as an extension member. */
export interface ProblemBody {
  type: string;
  title: string;
  status: number;
  detail: string;
  code: string;
  errors?: FieldProblem[];
  instance?: string;
}

const TITLES: Record<number, string> = {
  400: 'Bad request',
  401: 'Not authenticated',
  403: 'Not allowed',
  404: 'Not found',
  405: 'Method not allowed',
  409: 'Conflict',
  412: 'Precondition failed',
  413: 'Payload too large',
  415: 'Unsupported media type',
  422: 'Invalid input',
  428: 'Precondition required',
  429: 'Too many requests',
  500: 'Internal error',
  503: 'Service unavailable',
};

export function problemBody(status: number, code: string, detail: string, errors?: FieldProblem[]): ProblemBody {
  return {
    type: `https://fringe-ledger.invalid/problems/${code.replace(/_/g, '-')}`,
    title: TITLES[status] ?? 'Error',
    status,
    detail,
    code,
    ...(errors && errors.length > 0 ? { errors } : {}),
  };
}
