// The password-reset message. Pure.
import { escapeHtml, layout, linkButton, paragraphs } from "./html";
import { absoluteLink, mailDate, type MailMessage } from "./message";

export interface ResetInput {
  baseUrl: string;
  token: string;
  name: string;
  expiresAt: Date;
}

export const resetPath = (token: string) => `/reset/${encodeURIComponent(token)}`;

export function resetMessage(input: ResetInput): MailMessage {
  const link = absoluteLink(input.baseUrl, resetPath(input.token));
  const until = mailDate(input.expiresAt);
  const subject = "Choose a new Farfield password";
  const text = [
    `Hello ${input.name},`,
    "",
    "Someone asked to reset the password of your Farfield account. To choose a new one, open:",
    link,
    "",
    `The link works once and until ${until}. Choosing a new password signs you out everywhere.`,
    "If you did not ask for this, ignore this message: your password stays as it is.",
  ].join("\n");
  const html = layout(
    subject,
    paragraphs([`Hello ${escapeHtml(input.name)},`, "Someone asked to reset the password of your Farfield account."]) +
      linkButton(link, "Choose a new password") +
      paragraphs([
        `The link works once and until ${escapeHtml(until)}. Choosing a new password signs you out everywhere.`,
        "If you did not ask for this, ignore this message: your password stays as it is.",
        `Address of the link: ${escapeHtml(link)}`,
      ]),
  );
  return { subject, text, html };
}
