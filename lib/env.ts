import { z } from "zod";

/**
 * The server's configuration, parsed once from the process environment.
 * Every variable is documented in `.env.example`.
 */
const envSchema = z.object({
  DATABASE_URL: z.string().min(1).default("file:./data/leeway.db"),
  DATABASE_AUTH_TOKEN: z.string().optional(),
  NEXTAUTH_SECRET: z.string().min(16, "NEXTAUTH_SECRET must be at least 16 characters (run `npm run demo` once to write one into .env)"),
  NEXTAUTH_URL: z.url().default("http://localhost:3000"),
  LEEWAY_MODE: z.enum(["demo", "production"]).default("demo"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_FROM: z.string().default("Leeway <leeway@leeway.example>"),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

/** Parses the environment on first use and returns the same object afterwards. */
export function getEnv(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Leeway's environment is not valid:\n${lines.join("\n")}`);
  }
  cached = parsed.data;
  return cached;
}
