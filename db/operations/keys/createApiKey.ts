import { randomBytes } from 'node:crypto';
import type { Db } from '../../Db.ts';
import { apiKeys } from '../../schema/index.ts';
import type { Role } from '../Actor.ts';
import { hashApiKey } from './hashApiKey.ts';

export interface CreatedApiKey {
  id: string;
  label: string;
  role: Role;
  keyPrefix: string;
  createdAt: Date;
  /** The only time the secret exists outside the caller's hands: it is stored hashed. */
  secret: string;
}

export async function createApiKey(db: Db, labId: string, input: { label: string; role: Role }): Promise<CreatedApiKey> {
  const secret = `flk_${randomBytes(32).toString('base64url')}`;
  const [row] = await db
    .insert(apiKeys)
    .values({ labId, label: input.label, role: input.role, keyHash: hashApiKey(secret), keyPrefix: secret.slice(0, 12) })
    .returning();
  if (!row) throw new Error('insert returned no row');
  return { id: row.id, label: row.label, role: row.role, keyPrefix: row.keyPrefix, createdAt: row.createdAt, secret };
}
