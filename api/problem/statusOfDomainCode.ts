import type { DomainErrorCode } from '../../src/errors/DomainError.ts';

const STATUS: Record<DomainErrorCode, number> = {
  invalid_input: 422,
  implausible_value: 422,
  not_found: 404,
  conflict: 409,
  precondition_failed: 412,
  unauthorized: 401,
  forbidden: 403,
  payload_too_large: 413,
  rate_limited: 429,
  unavailable: 503,
};

export function statusOfDomainCode(code: DomainErrorCode): number {
  return STATUS[code];
}
