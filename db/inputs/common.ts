import { z } from 'zod';

/** A trimmed, non-blank label of bounded length. */
export const label = (max = 120) => z.string().trim().min(1, 'must not be blank').max(max);

export const optionalText = (max = 2000) => z.string().trim().max(max).optional();

/** Timestamps with an explicit offset, so a reading's time never depends on the server's zone. */
export const instant = z.iso.datetime({ offset: true });

export const uuid = z.uuid();

export const ListQuery = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  cursor: z.string().max(200).optional(),
});
export type ListQuery = z.infer<typeof ListQuery>;
