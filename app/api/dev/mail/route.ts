import path from "node:path";
import { NextResponse } from "next/server";
import { requireMailboxReader } from "@/lib/auth/mailbox-access";
import { env } from "@/lib/env";
import { route } from "@/lib/http/handler";
import { readMailbox } from "@/lib/mail/mailbox";

/** The messages the local fake SMTP server kept, newest first (demo directors, local use only). */
export const GET = route(async () => {
  await requireMailboxReader();
  return NextResponse.json({ messages: await readMailbox(path.resolve(env.MAIL_DIR)) });
});
