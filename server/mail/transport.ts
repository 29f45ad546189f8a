import nodemailer from "nodemailer";
import type { Env } from "../env";

/** Locally the SMTP fake on loopback; in production any hosted SMTP service from the env. */
export function createMailTransport(env: Env) {
  return nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    ignoreTLS: env.MAIL_MODE === "local",
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? "" } : undefined,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
}
export type MailTransport = ReturnType<typeof createMailTransport>;
