import type { Context } from 'hono';
import { HTTPException } from 'hono/http-exception';
import { DomainError } from '../../src/errors/DomainError.ts';
import { databaseErrorToProblem } from './databaseErrorToProblem.ts';
import { problemResponse } from './problemResponse.ts';
import { statusOfDomainCode } from './statusOfDomainCode.ts';

/** app.onError: the one place where any thrown error becomes an RFC 9457 answer. */
export function handleError(error: Error, c: Context): Response {
  if (error instanceof DomainError) {
    const headers: Record<string, string> = error.code === 'unavailable' ? { 'retry-after': '5' } : {};
    return problemResponse(statusOfDomainCode(error.code), error.code, error.message, error.problems, headers);
  }
  if (error instanceof HTTPException) {
    const status = error.status;
    const code = status === 413 ? 'payload_too_large' : status === 415 ? 'unsupported_media_type' : status === 400 ? 'malformed_request' : `http_${status}`;
    const detail = status === 413 ? 'The request body is larger than this route accepts.' : error.message || 'The request could not be read.';
    return problemResponse(status, code, detail);
  }
  const mapped = databaseErrorToProblem(error);
  if (mapped) return problemResponse(mapped.status, mapped.code, mapped.detail, mapped.errors, mapped.headers);
  if (error instanceof SyntaxError) return problemResponse(400, 'malformed_request', `The body is not valid: ${error.message}`);
  console.error(`[${c.req.method} ${c.req.path}] unexpected error`, error);
  return problemResponse(500, 'internal_error', 'An unexpected error occurred; it has been logged.');
}
