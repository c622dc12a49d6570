import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { mailboxEnabled } from "@/lib/auth/mailbox-access";
import { MailboxView } from "./MailboxView";

export const metadata: Metadata = { title: "Local mailbox" };

/** The messages the local fake SMTP server kept for the signed-in person (the API filters them by address). */
export default async function MailboxPage() {
  if (!mailboxEnabled()) notFound();
  const user = await requireSignedIn("/dev/mail");
  return (
    <PageShell userName={user.name}>
      <MailboxView email={user.email} />
    </PageShell>
  );
}
