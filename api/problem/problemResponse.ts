import type { FieldProblem } from '../../src/errors/DomainError.ts';
import { problemBody } from './problemBody.ts';

/** A problem+json response; the one constructor every error path in the API goes through. */
export function problemResponse(
  status: number,
  code: string,
  detail: string,
  errors?: FieldProblem[],
  headers: Record<string, string> = {},
): Response {
  return new Response(JSON.stringify(problemBody(status, code, detail, errors)), {
    status,
    headers: { 'content-type': 'application/problem+json', ...headers },
  });
}
