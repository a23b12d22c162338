import { z } from '@hono/zod-openapi';

export const IdParam = z.object({
  id: z.uuid().openapi({ param: { name: 'id', in: 'path' }, example: '0b5f8f7e-3c1d-4b8e-9a43-5f1e2d6c7a90' }),
});

export const ListQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50).openapi({ example: 50, description: 'Page size, at most 200.' }),
  cursor: z.string().max(200).optional().openapi({ description: 'nextCursor of the previous page.' }),
});
