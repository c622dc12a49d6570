import path from "node:path";
import { NextResponse } from "next/server";
import { requireMailboxReader } from "@/lib/auth/mailbox-access";
import { env } from "@/lib/env";
import { route } from "@/lib/http/handler";
import { readMailbox } from "@/lib/mail/mailbox";
import { messagesFor } from "@/lib/mail/mailbox-enabled";

/** The messages the local fake SMTP server kept for the signed-in person's own address, newest first (local use only). */
export const GET = route(async () => {
  const user = await requireMailboxReader();
  return NextResponse.json({ messages: messagesFor(await readMailbox(path.resolve(env.MAIL_DIR)), user.email) });
});
