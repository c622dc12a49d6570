// What every message builder returns: a subject, a plain-text body and its HTML alternative.
export interface MailMessage {
  subject: string;
  text: string;
  html: string;
}

/** Formats a date for a message in plain English, in UTC so every reader sees the same words. */
export function mailDate(date: Date): string {
  return date.toLocaleString("en-US", { dateStyle: "long", timeStyle: "short", timeZone: "UTC" }) + " UTC";
}

/** An absolute link on the configured base URL, keeping any path the base has (an app served under /band/). */
export function absoluteLink(baseUrl: string, path: string): string {
  return new URL(path.replace(/^\/+/, ""), baseUrl.endsWith("/") ? baseUrl : baseUrl + "/").toString();
}
