import { z } from "zod";

const port = z.coerce.number().int().min(1).max(65535);

export const envSchema = z
  .object({
    DATABASE_URL: z
      .string({ error: "DATABASE_URL is required (postgres://user@host:port/db)" })
      .regex(/^postgres(ql)?:\/\//, "DATABASE_URL must start with postgres:// or postgresql://"),
    PORT: port.default(4310),
    SESSION_SECRET: z
      .string({ error: "SESSION_SECRET is required (at least 16 characters)" })
      .min(16, "SESSION_SECRET must be at least 16 characters"),
    APP_URL: z.url("APP_URL must be an absolute URL such as http://127.0.0.1:4310").optional(),
    SMTP_HOST: z.string().min(1).default("127.0.0.1"),
    SMTP_PORT: port.default(2525),
    MAIL_FROM: z.string().min(3).default("Equilibrist <no-reply@equilibrist.local>"),
    NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  })
  .transform((e) => ({ ...e, APP_URL: (e.APP_URL ?? `http://127.0.0.1:${e.PORT}`).replace(/\/+$/, "") }));

export type Env = z.infer<typeof envSchema>;

/** Parses an environment; throws a ZodError listing every wrong variable. */
export function parseEnv(source: NodeJS.ProcessEnv): Env {
  return envSchema.parse(withoutEmpty(source));
}

/** An empty variable (`PORT=`) counts as unset, so its default applies. */
function withoutEmpty(source: NodeJS.ProcessEnv): Record<string, string> {
  return Object.fromEntries(Object.entries(source).filter((e): e is [string, string] => !!e[1]));
}

/** Parses process.env, or prints what is wrong and exits with status 1. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const result = envSchema.safeParse(withoutEmpty(source));
  if (result.success) return result.data;
  const lines = result.error.issues.map((i) => `  ${i.path.join(".") || "env"}: ${i.message}`);
  process.stderr.write(`[equilibrist] the environment is not valid:\n${lines.join("\n")}\n`);
  process.exit(1);
}
