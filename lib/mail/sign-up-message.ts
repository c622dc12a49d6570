// The two messages a sign-up sends: the link that creates a new account, and a notice to the owner of
// an address that already has one. The sign-up answer is the same for both. Pure.
import { escapeHtml, layout, linkButton, paragraphs } from "./html";
import { absoluteLink, mailDate, type MailMessage } from "./message";

export const signUpConfirmPath = (token: string) => `/sign-up/${encodeURIComponent(token)}`;

export function signUpConfirmMessage(input: { baseUrl: string; token: string; name: string; programName: string; expiresAt: Date }): MailMessage {
  const link = absoluteLink(input.baseUrl, signUpConfirmPath(input.token));
  const until = mailDate(input.expiresAt);
  const subject = "Confirm your new Farfield account";
  const intro = `Someone, probably you, asked to create a Farfield account for this address, with a new band program called ${input.programName}.`;
  const text = [`Hello ${input.name},`, "", intro, "To create the account, open:", link, "", `The link works once and until ${until}.`, "If you did not ask for this, ignore this message: no account is created."].join("\n");
  const html = layout(
    subject,
    paragraphs([`Hello ${escapeHtml(input.name)},`, escapeHtml(intro)]) +
      linkButton(link, "Create my account") +
      paragraphs([`The link works once and until ${escapeHtml(until)}. If you did not ask for this, ignore this message: no account is created.`, `Address of the link: ${escapeHtml(link)}`]),
  );
  return { subject, text, html };
}

export function signUpExistingMessage(input: { baseUrl: string; name: string }): MailMessage {
  const signIn = absoluteLink(input.baseUrl, "/sign-in");
  const reset = absoluteLink(input.baseUrl, "/reset");
  const subject = "Someone tried to create a Farfield account with your address";
  const intro = "Someone, perhaps you, tried to create a new Farfield account with this address. It already has an account, so nothing was created and nothing changed.";
  const text = [`Hello ${input.name},`, "", intro, "", `To sign in: ${signIn}`, `If you forgot your password: ${reset}`, "", "If this was not you, you can ignore this message."].join("\n");
  const html = layout(
    subject,
    paragraphs([`Hello ${escapeHtml(input.name)},`, escapeHtml(intro)]) +
      linkButton(signIn, "Sign in") +
      paragraphs([`If you forgot your password, choose a new one: ${escapeHtml(reset)}`, "If this was not you, you can ignore this message."]),
  );
  return { subject, text, html };
}
