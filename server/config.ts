import { z } from 'zod';

/**
 * All configuration comes from the environment, read once and validated, so a
 * missing secret stops the process with a message instead of a silent default.
 */
const configSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  PUBLIC_URL: z.string().url().optional(),
  DATABASE_URL: z.string().regex(/^mariadb:\/\//, 'DATABASE_URL must start with mariadb://'),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters'),
  TRUST_PROXY: z.enum(['0', '1']).default('0'),
  MEILI_HOST: z.string().url().optional(),
  MEILI_KEY: z.string().optional(),
  SEARCH_INDEX_PREFIX: z.string().regex(/^[A-Za-z0-9_-]*$/).default(''),
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default('Windway <no-reply@windway.invalid>'),
  MAIL_CAPTURE_DIR: z.string().optional(),
  STORAGE_DIR: z.string().default('.data/files'),
  UPLOAD_MAX_BYTES: z.coerce.number().int().positive().default(100 * 1024 * 1024),
  UPLOAD_MAX_PAGES: z.coerce.number().int().positive().default(2000),
  LOGIN_MAX_ATTEMPTS: z.coerce.number().int().positive().default(10),
  CSL_STYLES_DIR: z.string().default('/usr/share/citation-style-language/styles'),
  DEMO: z.enum(['0', '1']).default('0'),
});

export type Config = z.infer<typeof configSchema>;

let cached: Config | undefined;

export function getConfig(): Config {
  if (cached) return cached;
  const parsed = configSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Windway's configuration is incomplete:\n${lines.join('\n')}`);
  }
  cached = parsed.data;
  return cached;
}

/** Tests change the environment between files; they call this to re-read it. */
export function resetConfigCache(): void {
  cached = undefined;
}

export function publicUrl(config: Config = getConfig()): string {
  return config.PUBLIC_URL ?? `http://${config.HOST}:${config.PORT}`;
}
