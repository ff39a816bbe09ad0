// The SMTP connection, through nodemailer. Short timeouts: a server that does not answer
// fails the attempt quickly, and the job is retried with backoff.
import nodemailer, { type Transporter } from "nodemailer";
import type { SmtpSettings } from "@/env";

export function createMailTransport(settings: SmtpSettings): Transporter {
  return nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.port === 465,
    auth: settings.auth,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 15_000,
  });
}
