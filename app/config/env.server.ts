import { z } from "zod";

// Read and validated once at boot: a missing setting is a clear start-up error, not a runtime surprise.
const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  APP_URL: z.url().default("http://127.0.0.1:3000"),
  DB_HOST: z.string().default("127.0.0.1"),
  DB_PORT: z.coerce.number().int().positive().default(3307),
  DB_NAME: z.string().default("dryside"),
  DB_USER: z.string().default("root"),
  DB_PASSWORD: z.string().default(""),
  SESSION_SECRET: z.string().min(32, "SESSION_SECRET must be at least 32 characters"),
  STORAGE_DIR: z.string().default(".data/storage"),
  STRIPE_SECRET_KEY: z.string().default("sk_test_standin"),
  STRIPE_API_HOST: z.string().optional(),
  STRIPE_API_PORT: z.coerce.number().int().positive().optional(),
  STRIPE_API_PROTOCOL: z.enum(["http", "https"]).default("https"),
  STRIPE_WEBHOOK_SECRET: z.string().default("whsec_standin_local"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  SMTP_SECURE: z.stringbool().default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default("Dryside <desk@dryside.invalid>"),
  MAIL_OUTBOX_DIR: z.string().default(".data/outbox"),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

/** Just the database settings: the Sequelize singleton is built at import, before other settings matter. */
export function databaseEnv() {
  return envSchema
    .pick({ DB_HOST: true, DB_PORT: true, DB_NAME: true, DB_USER: true, DB_PASSWORD: true })
    .parse(process.env);
}

export function env(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join(".")}: ${issue.message}`);
    throw new Error(`Dryside cannot start: invalid environment\n${lines.join("\n")}`);
  }
  cached = parsed.data;
  return cached;
}
