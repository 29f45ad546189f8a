import { z } from "zod";
import { ATTACHMENT_MAX_BYTES, LOG_MAX_BYTES } from "../shared/schemas/boil-off-test";

/**
 * Every setting the server reads, parsed once at start. A bad value stops the process with
 * every bad variable named, before anything listens.
 */
const EnvSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default("127.0.0.1"),
  DATABASE_URL: z.string().regex(/^mysql:\/\//, "must start with mysql://"),
  /** The public address of the app; links in e-mail and the origin check use it. */
  APP_ORIGIN: z.url(),
  /** local: an SMTP fake on loopback catches mail and owners see it on the Outbox page. */
  MAIL_MODE: z.enum(["local", "smtp"]).default("local"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_SECURE: z.enum(["true", "false"]).default("false").transform((v) => v === "true"),
  MAIL_FROM: z.string().default("Frostfold <no-reply@frostfold.example>"),
  /** Secure cookies everywhere but on a loopback address. */
  COOKIE_SECURE: z.enum(["auto", "true", "false"]).default("auto"),
  SIGN_IN_LIMIT_PER_IP: z.coerce.number().int().min(1).default(20),
  SIGN_IN_LIMIT_PER_EMAIL: z.coerce.number().int().min(1).default(8),
  SIGN_IN_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "trace", "silent"]).default("info"),
  CLIENT_DIST: z.string().default("dist/client"),
  /**
   * Object storage for logger files and attachments: any S3-compatible service. The defaults
   * point at the local S3 fake that `npm start` runs on loopback (s3rver's fixed credentials).
   */
  /** An empty value means the SDK's own endpoint for S3_REGION. */
  S3_ENDPOINT: z.union([z.literal(""), z.url()], { error: "must be an http(s) URL, or empty for the SDK's default endpoint" }).default("http://127.0.0.1:4569"),
  S3_BUCKET: z.string().regex(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, "must be an S3 bucket name (3-63 lower-case letters, digits, dots, hyphens)").default("frostfold"),
  S3_REGION: z.string().min(1).default("us-east-1"),
  S3_ACCESS_KEY_ID: z.string().min(1).default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().min(1).default("S3RVER"),
  S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).default("true").transform((v) => v === "true"),
  /** Upload limits in bytes (logger files, attachments); lower them, never raise them past the defaults' order without checking memory. */
  LOG_MAX_BYTES: z.coerce.number().int().min(1024).default(LOG_MAX_BYTES),
  ATTACHMENT_MAX_BYTES: z.coerce.number().int().min(1024).default(ATTACHMENT_MAX_BYTES),
});
export type Env = z.infer<typeof EnvSchema>;

export function parseEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const result = EnvSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join(".") || "(env)"}: ${i.message}`);
    throw new Error(`Frostfold cannot start; fix these environment variables:\n${lines.join("\n")}`);
  }
  return result.data;
}

export function cookieSecure(env: Env): boolean {
  if (env.COOKIE_SECURE !== "auto") return env.COOKIE_SECURE === "true";
  const host = new URL(env.APP_ORIGIN).hostname;
  return !(host === "127.0.0.1" || host === "localhost" || host === "[::1]");
}
