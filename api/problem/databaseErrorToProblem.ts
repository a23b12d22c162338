import type { FieldProblem } from '../../src/errors/DomainError.ts';

interface PgErrorLike {
  code?: string;
  constraint?: string;
  constraint_name?: string;
  detail?: string;
  message?: string;
}

export interface MappedProblem {
  status: number;
  code: string;
  detail: string;
  errors?: FieldProblem[];
  headers?: Record<string, string>;
}

const CONNECTION_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'CONNECTION_CLOSED', 'CONNECTION_ENDED', 'CONNECTION_DESTROYED', 'CONNECT_TIMEOUT', '57P01', '57P02', '57P03', '08006', '08001', '08003', '08004']);

/** Finds the driver error under drizzle's wrapper (both drivers put the SQLSTATE in `code`). */
function driverError(error: unknown): PgErrorLike | undefined {
  let current: unknown = error;
  for (let depth = 0; depth < 5 && current; depth++) {
    const candidate = current as PgErrorLike & { cause?: unknown };
    if (typeof candidate.code === 'string') return candidate;
    current = candidate.cause;
  }
  return undefined;
}

/**
 * Turns a database refusal into a 4xx or 503 answer. Constraint names are part of the answer so
 * a client sees which rule the data broke even when it came past the API's own validation.
 */
export function databaseErrorToProblem(error: unknown): MappedProblem | undefined {
  const pg = driverError(error);
  if (!pg?.code) return undefined;
  const constraint = pg.constraint ?? pg.constraint_name;
  const field = constraint ? [{ field: constraint, message: pg.detail ?? pg.message ?? 'violated' }] : undefined;
  switch (pg.code) {
    case '23505':
      return { status: 409, code: 'conflict', detail: `A record with the same unique value exists (${constraint ?? 'unique'}).`, errors: field };
    case '23503':
      return { status: 422, code: 'invalid_reference', detail: 'A referenced record does not exist in this lab.', errors: field };
    case '23514':
    case '23502':
      return { status: 422, code: 'invalid_input', detail: `The database refused the values (${constraint ?? pg.code}).`, errors: field };
    case '22P02':
    case '22003':
    case '22007':
    case '22008':
    case '22023':
    case '22021':
    case '22P05':
      return { status: 422, code: 'invalid_input', detail: pg.message ?? 'A value has the wrong form.' };
    case 'FL001':
      return { status: 409, code: 'record_immutable', detail: 'Records are never edited or deleted; submit an amendment.' };
    case '40001':
    case '40P01':
      return { status: 409, code: 'conflict', detail: 'A concurrent change collided with this one; retry.', headers: { 'retry-after': '1' } };
    default:
      if (CONNECTION_CODES.has(pg.code)) {
        return { status: 503, code: 'unavailable', detail: 'The database is unreachable; retry shortly.', headers: { 'retry-after': '5' } };
      }
      return undefined;
  }
}
