import type { z } from '@hono/zod-openapi';

export const jsonBody = <T extends z.ZodTypeAny>(schema: T) => ({
  required: true,
  content: { 'application/json': { schema } },
});

export const jsonResponse = <T extends z.ZodTypeAny>(schema: T, description: string) => ({
  description,
  content: { 'application/json': { schema } },
});
