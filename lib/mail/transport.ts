import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

// Plain SMTP to the configured host; in development, demo and tests that is the local mail
// catcher started by the project's own scripts (lib/mail/catcher.ts).
let transporter: Transporter | null = null;

export function mailTransport(): Transporter {
  if (!transporter) {
    const e = env();
    transporter = nodemailer.createTransport({
      host: e.smtpHost,
      port: e.smtpPort,
      secure: false,
      ignoreTLS: true,
      connectionTimeout: 5000,
      greetingTimeout: 5000,
      socketTimeout: 10000,
    });
  }
  return transporter;
}
