// The invitation to join a program. Pure.
import { escapeHtml, layout, linkButton, paragraphs } from "./html";
import { absoluteLink, mailDate, type MailMessage } from "./message";

const ROLE_WORDS = {
  director: "a director (members, music, balance plans and everything else)",
  designer: "the drill designer (roster, sets, positions and imports)",
  staff: "a staff member (read every screen, record box readings, print sheets)",
} as const;

export interface InvitationInput {
  baseUrl: string;
  token: string;
  programName: string;
  role: keyof typeof ROLE_WORDS;
  inviterName: string;
  expiresAt: Date;
}

export const invitationPath = (token: string) => `/invitations/${encodeURIComponent(token)}`;

export function invitationMessage(input: InvitationInput): MailMessage {
  const link = absoluteLink(input.baseUrl, invitationPath(input.token));
  const subject = `${input.inviterName} invited you to ${input.programName} on Farfield`;
  const until = mailDate(input.expiresAt);
  const text = [
    `${input.inviterName} invited you to join ${input.programName} on Farfield as ${ROLE_WORDS[input.role]}.`,
    "",
    "Open this link to accept. You can create an account there, or join with the account you already have:",
    link,
    "",
    `The link works once and until ${until}.`,
  ].join("\n");
  const html = layout(
    subject,
    paragraphs([
      `${escapeHtml(input.inviterName)} invited you to join <strong>${escapeHtml(input.programName)}</strong> on Farfield as ${escapeHtml(ROLE_WORDS[input.role])}.`,
      "Accept to create an account, or to join with the account you already have.",
    ]) +
      linkButton(link, "Accept the invitation") +
      paragraphs([`The link works once and until ${escapeHtml(until)}. If the button does not work, paste this address into your browser: ${escapeHtml(link)}`]),
  );
  return { subject, text, html };
}
