// Reading one file from a multipart/form-data request, with the size limit applied while reading.
import { decodeUploadText } from "@/lib/imports/text";
import { readBytesLimited } from "./body";
import { badRequest, tooLarge } from "./errors";

export interface UploadedFile {
  fileName: string;
  bytes: Buffer;
  fields: Record<string, string>;
}

// Room for the multipart boundaries and the small text fields next to the file.
const ENVELOPE_BYTES = 16_384;

/** The file under `field` and the other text fields; 413 past `maxFileBytes`, 400 when there is no file. */
export async function readUpload(req: Request, maxFileBytes: number, field = "file"): Promise<UploadedFile> {
  const type = req.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) throw badRequest("Send the file as multipart/form-data with a field named \"file\".");
  const message = `The file is larger than ${Math.round(maxFileBytes / 1000)} kB; split it or remove what is not needed.`;
  const raw = await readBytesLimited(req, maxFileBytes + ENVELOPE_BYTES, message);
  let form: FormData;
  try {
    form = await new Response(new Uint8Array(raw), { headers: { "content-type": type } }).formData();
  } catch {
    throw badRequest("The upload could not be read as multipart/form-data.");
  }
  const file = form.get(field);
  if (!file || typeof file === "string") throw badRequest(`The upload has no file in the field "${field}".`);
  const bytes = Buffer.from(await file.arrayBuffer());
  if (bytes.byteLength > maxFileBytes) throw tooLarge(message);
  const fields: Record<string, string> = {};
  for (const [k, v] of form.entries()) if (typeof v === "string") fields[k] = v;
  return { fileName: (file.name || "upload").slice(0, 200), bytes, fields };
}

/** An uploaded file's text; 400 naming the problem when it is binary or not UTF-8. */
export function uploadText(bytes: Buffer): string {
  const decoded = decodeUploadText(bytes);
  if (!decoded.ok) throw badRequest(decoded.reason, { file: [decoded.reason] });
  return decoded.text;
}
