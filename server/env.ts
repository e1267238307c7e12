import { z } from 'zod';

/**
 * Configuration comes only from the environment so that a deployment can point the same code at a
 * managed PostgreSQL, a real S3 bucket and a real SMTP relay. Validated once at start.
 */
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  /** The origin browsers use to reach the app; used for the CSRF origin check and e-mailed links. */
  PUBLIC_URL: z.string().url().optional(),
  DATABASE_URL: z.string().url(),
  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(3).default('quillane-files'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  S3_FORCE_PATH_STYLE: z
    .enum(['true', 'false'])
    .default('true')
    .transform((v) => v === 'true'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535),
  SMTP_SECURE: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default('Quillane <notebook@quillane.test>'),
  /** Where the built client lives; the server serves it when present. */
  CLIENT_DIST: z.string().default('dist/client'),
  UPLOAD_MAX_BYTES: z.coerce.number().int().positive().default(100 * 1024 * 1024),
  JSON_BODY_LIMIT: z.string().default('1mb'),
  /** Sign-in throttle: attempts per window, per account and per address. */
  SIGN_IN_MAX_ATTEMPTS: z.coerce.number().int().positive().default(5),
  SIGN_IN_WINDOW_SECONDS: z.coerce.number().int().positive().default(15 * 60),
});

export type Config = z.infer<typeof envSchema> & { publicUrl: string };

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Quillane configuration is invalid:\n${problems}`);
  }
  const config = parsed.data;
  return { ...config, publicUrl: config.PUBLIC_URL ?? `http://${config.HOST}:${config.PORT}` };
}
