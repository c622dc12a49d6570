// Reading and validating request input: size limit first, then JSON, then zod.
import type { z } from "zod";
import { MAX_JSON_DEPTH } from "@/lib/limits";
import { badRequest, tooLarge } from "./errors";

export const MAX_JSON_BYTES = 1_000_000;

/**
 * True when arrays and objects in the JSON text nest deeper than `max`. Checked before parsing: a
 * deeply nested value passes JSON.parse but overflows the stack of whatever walks it later.
 */
export function nestsDeeper(text: string, max = MAX_JSON_DEPTH): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92) i++; // backslash: skip the escaped character
      else if (c === 34) inString = false;
    } else if (c === 34) inString = true;
    else if (c === 91 || c === 123) {
      if (++depth > max) return true;
    } else if (c === 93 || c === 125) depth--;
  }
  return false;
}

/** JSON text as a value, or null when it is not JSON; refuses (400) nesting past MAX_JSON_DEPTH. */
export function parseJsonText(text: string, what = "The request body"): { value: unknown } | null {
  if (nestsDeeper(text)) throw badRequest(`${what} nests arrays or objects more than ${MAX_JSON_DEPTH} levels deep.`);
  try {
    return { value: JSON.parse(text) };
  } catch {
    return null;
  }
}

/** Field errors keyed by dotted path, as shared/API.md's `issues`. */
export function fieldIssues(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.map(String).join(".") : "(body)";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/** "positions.0.x" → "positions 1, x": a field's place as a person counts it. */
function fieldWords(path: string): string {
  if (path === "(body)") return "";
  return path
    .split(".")
    .map((part) => (/^\d+$/.test(part) ? String(Number(part) + 1) : part.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase()))
    .join(", ");
}

/** What to change, for a person: the first few field problems by name ("The form needs a change: name: …"). */
export function validationMessage(issues: Record<string, string[]>, what = "The form"): string {
  const parts = Object.entries(issues)
    .slice(0, 3)
    .map(([path, messages]) => {
      const where = fieldWords(path);
      return `${where ? `${where}: ` : ""}${messages[0]}`;
    });
  const more = Object.keys(issues).length - parts.length;
  const end = parts.join("; ").replace(/\.$/, "");
  return `${what} needs ${parts.length === 1 && !more ? "a change" : "changes"}: ${end}${more > 0 ? `; and ${more} more` : ""}. Change ${parts.length === 1 && !more ? "it" : "them"} and send again.`;
}

export function parseWith<T extends z.ZodType>(schema: T, value: unknown, what = "The request"): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) {
    const issues = fieldIssues(result.error);
    throw badRequest(validationMessage(issues, what), issues);
  }
  return result.data;
}

export async function readJson<T extends z.ZodType>(req: Request, schema: T, maxBytes = MAX_JSON_BYTES): Promise<z.infer<T>> {
  const parsed = parseJsonText(await readTextLimited(req, maxBytes));
  if (!parsed) throw badRequest("The request body is not JSON: send the form again, or check the script that sent it.");
  return parseWith(schema, parsed.value, "The form");
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
