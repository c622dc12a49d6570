// Reading and validating request input: size limit first, then JSON, then zod.
import type { z } from "zod";
import { badRequest, tooLarge } from "./errors";

export const MAX_JSON_BYTES = 1_000_000;

/** Field errors keyed by dotted path, as shared/API.md's `issues`. */
export function fieldIssues(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.map(String).join(".") : "(body)";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export function parseWith<T extends z.ZodType>(schema: T, value: unknown, what = "The request"): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw badRequest(`${what} is not valid.`, fieldIssues(result.error));
  return result.data;
}

export async function readJson<T extends z.ZodType>(req: Request, schema: T, maxBytes = MAX_JSON_BYTES): Promise<z.infer<T>> {
  const text = await readTextLimited(req, maxBytes);
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw badRequest("The request body is not valid JSON.");
  }
  return parseWith(schema, value, "The request body");
}

/** The raw body, refused with 413 (and `message`) once it passes `maxBytes`, whatever Content-Length claims. */
export async function readBytesLimited(req: Request, maxBytes: number, message?: string): Promise<Buffer> {
  if (Number(req.headers.get("content-length") ?? "0") > maxBytes) throw tooLarge(message);
  if (!req.body) return Buffer.alloc(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel();
      throw tooLarge(message);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

async function readTextLimited(req: Request, maxBytes: number): Promise<string> {
  return new TextDecoder("utf-8", { fatal: false }).decode(await readBytesLimited(req, maxBytes));
}
