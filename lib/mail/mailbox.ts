// Reads the messages the local fake SMTP server kept (scripts/fake-smtp.ts writes MAIL_DIR/index.jsonl).
import { readFile } from "node:fs/promises";
import path from "node:path";
import { z } from "zod";

export const MAILBOX_INDEX = "index.jsonl";

export const keptMessageSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  file: z.string(),
});
export type KeptMessage = z.infer<typeof keptMessageSchema>;

/** Every kept message, newest first; an absent folder is an empty mailbox, a damaged line is skipped. */
export async function readMailbox(dir: string): Promise<KeptMessage[]> {
  let raw: string;
  try {
    raw = await readFile(path.join(dir, MAILBOX_INDEX), "utf8");
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return [];
    throw err;
  }
  const out: KeptMessage[] = [];
  for (const line of raw.split("\n")) {
    if (!line.trim()) continue;
    try {
      const parsed = keptMessageSchema.safeParse(JSON.parse(line));
      if (parsed.success) out.push(parsed.data);
    } catch {}
  }
  return out.reverse();
}
