import { z } from '@hono/zod-openapi';

export const ProblemSchema = z
  .object({
    type: z.string(),
    title: z.string(),
    status: z.number().int(),
    detail: z.string(),
    code: z.string(),
    errors: z.array(z.object({ field: z.string(), message: z.string(), row: z.number().int().optional() })).optional(),
  })
  .openapi('Problem', {
    example: {
      type: 'https://fringe-ledger.invalid/problems/invalid-input',
      title: 'Invalid input',
      status: 422,
      detail: 'The body did not pass validation (1 problem).',
      code: 'invalid_input',
      errors: [{ field: 'json.thicknessMm', message: 'Too big: expected number to be <=300' }],
    },
  });

const problem = (description: string) => ({ description, content: { 'application/problem+json': { schema: ProblemSchema } } });

export const problemResponses = {
  401: problem('No key, or an unknown or revoked key'),
  403: problem('The key\'s role may not do this'),
  404: problem('No such record in this lab'),
  422: problem('The input failed validation or a database constraint'),
} as const;

export { problem as problemResponseSpec };
