import { sql } from 'drizzle-orm';
import { check, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { keyRole } from './enums.ts';

export const labs = pgTable(
  'labs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    name: text('name').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
  },
  (t) => [check('labs_name_not_blank', sql`length(trim(${t.name})) > 0`)],
);

export const apiKeys = pgTable(
  'api_keys',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id')
      .notNull()
      .references(() => labs.id),
    label: text('label').notNull(),
    role: keyRole('role').notNull(),
    // Keys are 256-bit random secrets, so a SHA-256 digest is enough: no password stretching needed.
    keyHash: text('key_hash').notNull().unique(),
    keyPrefix: text('key_prefix').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
    revokedAt: timestamp('revoked_at', { withTimezone: true, precision: 3 }),
  },
  (t) => [
    index('api_keys_lab_idx').on(t.labId),
    check('api_keys_hash_is_sha256_hex', sql`${t.keyHash} ~ '^[0-9a-f]{64}$'`),
    check('api_keys_label_not_blank', sql`length(trim(${t.label})) > 0`),
  ],
);
