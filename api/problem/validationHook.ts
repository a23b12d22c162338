import type { Context } from 'hono';
import type { ZodError } from 'zod';
import { problemResponse } from './problemResponse.ts';

type HookResult = { success: true } | { success: false; error: ZodError; target?: string };

/** defaultHook of the OpenAPI app: zod failures become problem+json with one entry per field. */
export function validationHook(result: HookResult, _c: Context): Response | undefined {
  if (result.success) return undefined;
  const where = result.target ?? 'request';
  const errors = result.error.issues.map((issue) => ({
    field: [where, ...issue.path.map(String)].join('.'),
    message: issue.message,
  }));
  return problemResponse(422, 'invalid_input', `The ${where} did not pass validation (${errors.length} problem${errors.length === 1 ? '' : 's'}).`, errors);
}
