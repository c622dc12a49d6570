// Sends messages over SMTP with nodemailer. The settings come from the environment, so the local
// fake server and a hosted provider differ only in host, port and credentials.
import "server-only";
import type { Transporter } from "nodemailer";
import { createTransport } from "./smtp";
import { env } from "@/lib/env";
import type { MailMessage } from "./message";

const holder = globalThis as unknown as { farfieldMail?: Transporter };

/** Sends one message to one or more addresses; resolves with the SMTP message id. */
export async function sendMail(to: string | string[], message: MailMessage): Promise<string> {
  const transport = (holder.farfieldMail ??= createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    user: env.SMTP_USER,
    password: env.SMTP_PASSWORD,
  }));
  const info = await transport.sendMail({ from: env.SMTP_FROM, to, subject: message.subject, text: message.text, html: message.html });
  return info.messageId;
}

/** Sends and reports failure as false (logged), for writes that should stand even when mail is down. */
export async function trySendMail(to: string | string[], message: MailMessage): Promise<boolean> {
  try {
    await sendMail(to, message);
    return true;
  } catch (err) {
    console.error("[farfield] mail not sent:", err instanceof Error ? err.message : err);
    return false;
  }
}
