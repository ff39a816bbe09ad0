import { z } from "zod";

// The server's environment, read and validated once, on first use (not at import time,
// so that `next build` does not need a database).
const serverEnvSchema = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  DATABASE_URL: z.string().url(),
  NEXTAUTH_SECRET: z.string().min(16, "NEXTAUTH_SECRET: must be at least 16 characters"),
  NEXTAUTH_URL: z.string().url(),
  /** Set when this instance runs as a demo or a test deployment (enables the development inbox). */
  GUYLINE_DEV_TOOLS: z
    .enum(["on", "off"])
    .default("off")
    .transform((value) => value === "on"),
  // Outgoing mail (read by the worker, scripts/worker.ts). Development, demo and tests point
  // these at the local capture server (scripts/mail-server.ts); production at the club's
  // SMTP service. Port 465 means TLS from the start; other ports upgrade with STARTTLS.
  SMTP_HOST: z.string().min(1).optional(),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(587),
  SMTP_USER: z.string().min(1).optional(),
  SMTP_PASSWORD: z.string().min(1).optional(),
  /** The sender, e.g. "Guyline <guyline@club.example>"; defaults to guyline@ the served host. */
  MAIL_FROM: z.string().min(3).optional(),
});

export type ServerEnv = z.infer<typeof serverEnvSchema>;

let cached: ServerEnv | undefined;

export function serverEnv(): ServerEnv {
  if (!cached) {
    const parsed = serverEnvSchema.safeParse(process.env);
    if (!parsed.success) {
      const problems = parsed.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`);
      throw new Error(`Guyline's environment is incomplete:\n${problems.join("\n")}`);
    }
    cached = parsed.data;
  }
  return cached;
}

/** The app's public address without a trailing slash, for links in mail, calendar files and labels. */
export function appUrl(): string {
  return serverEnv().NEXTAUTH_URL.replace(/\/$/, "");
}

export interface SmtpSettings {
  host: string;
  port: number;
  auth?: { user: string; pass: string };
  from: string;
}

/** What the worker needs to send mail; refuses to guess a server. */
export function smtpSettings(): SmtpSettings {
  const env = serverEnv();
  if (!env.SMTP_HOST) {
    throw new Error("Guyline's environment is incomplete:\nSMTP_HOST: the worker needs an SMTP server to send mail (scripts/start.sh starts a local one).");
  }
  if (!!env.SMTP_USER !== !!env.SMTP_PASSWORD) {
    throw new Error("Guyline's environment is incomplete:\nSMTP_USER and SMTP_PASSWORD: give both or neither.");
  }
  return {
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    ...(env.SMTP_USER && env.SMTP_PASSWORD ? { auth: { user: env.SMTP_USER, pass: env.SMTP_PASSWORD } } : {}),
    from: env.MAIL_FROM ?? `Guyline <guyline@${new URL(env.NEXTAUTH_URL).hostname}>`,
  };
}
