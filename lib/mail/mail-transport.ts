import nodemailer, { type Transporter } from "nodemailer";
import { env } from "../env";

// One SMTP connection setup per process: building a transport per message would re-resolve and
// re-handshake each time. Settings come from env() alone (the fake in dev/test, a provider in production).
let transport: Transporter | undefined;

export function mailTransport(): Transporter {
  if (transport) return transport;
  const e = env();
  transport = nodemailer.createTransport({
    host: e.SMTP_HOST,
    port: e.SMTP_PORT,
    secure: e.SMTP_SECURE,
    auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASS ?? "" } : undefined,
  });
  return transport;
}
