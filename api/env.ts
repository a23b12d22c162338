import { z } from 'zod';

const EnvSchema = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(8787),
  HOST: z.string().min(1).default('127.0.0.1'),
  DATABASE_URL: z
    .string()
    .url()
    .refine((u) => /^postgres(ql)?:\/\//.test(u), 'must be a postgres:// or postgresql:// URL')
    .optional(),
  DATA_DIR: z.string().min(1).default('.data'),
  BODY_LIMIT_BYTES: z.coerce.number().int().positive().default(1_048_576),
  IMPORT_LIMIT_BYTES: z.coerce.number().int().positive().default(32 * 1_048_576),
  DB_POOL_SIZE: z.coerce.number().int().min(1).max(100).default(10),
  LOAD_DEMO: z.enum(['auto', 'never']).default('auto'),
  /** Wrong keys one client address may present per window before it gets 429. */
  AUTH_FAILURE_LIMIT: z.coerce.number().int().min(1).max(100_000).default(20),
  AUTH_FAILURE_WINDOW_S: z.coerce.number().int().min(1).max(86_400).default(300),
});

export type AppConfig = z.infer<typeof EnvSchema>;

/**
 * Parses the environment once at start-up; everything after receives the result. An empty
 * variable counts as unset so `DATABASE_URL= npm start` means the embedded database.
 */
export function parseEnv(env: Record<string, string | undefined>): AppConfig {
  const cleaned = Object.fromEntries(Object.entries(env).filter(([, v]) => v !== undefined && v !== ''));
  const parsed = EnvSchema.safeParse(cleaned);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Configuration error:\n${lines.join('\n')}`);
  }
  return parsed.data;
}

/** Settings the tests and in-process callers use: same schema, no environment read. */
export function defaultConfig(overrides: Partial<AppConfig> = {}): AppConfig {
  return { ...EnvSchema.parse({}), ...overrides };
}
