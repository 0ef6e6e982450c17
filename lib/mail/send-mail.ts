import { env } from "../env";
import { mailTransport } from "./mail-transport";

export type OutgoingMail = { to: string | string[]; subject: string; text: string; html?: string };

/** Sends one message from MAIL_FROM; resolves once the SMTP server accepted it. */
export async function sendMail(mail: OutgoingMail): Promise<{ messageId: string }> {
  const info = await mailTransport().sendMail({
    from: env().MAIL_FROM,
    to: mail.to,
    subject: mail.subject,
    text: mail.text,
    html: mail.html,
  });
  return { messageId: info.messageId };
}
