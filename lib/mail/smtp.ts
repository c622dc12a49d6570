// The nodemailer transport for a set of SMTP settings (no environment read here, so tests can aim it anywhere).
import nodemailer, { type Transporter } from "nodemailer";

export interface SmtpSettings {
  host: string;
  port: number;
  user?: string;
  password?: string;
}

/** A transport for these settings: implicit TLS on 465, STARTTLS when the server offers it elsewhere. */
export function createTransport(s: SmtpSettings): Transporter {
  return nodemailer.createTransport({
    host: s.host,
    port: s.port,
    secure: s.port === 465,
    auth: s.user ? { user: s.user, pass: s.password ?? "" } : undefined,
    // A dead server fails the send in seconds instead of holding the request.
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 15_000,
  });
}
