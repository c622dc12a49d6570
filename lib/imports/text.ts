// An uploaded file as text: UTF-8 only (a byte-order mark is allowed). Binary files, UTF-16 and
// legacy encodings are refused with a reason a spreadsheet user can act on. Pure.
export type DecodedText = { ok: true; text: string } | { ok: false; reason: string };

export function decodeUploadText(bytes: Uint8Array): DecodedText {
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    return { ok: false, reason: "The file is UTF-16 text. Save it as CSV UTF-8 and upload it again." };
  }
  if (bytes.includes(0)) return { ok: false, reason: "This is not a text file. Upload the CSV (or show file) itself, saved as UTF-8." };
  try {
    return { ok: true, text: new TextDecoder("utf-8", { fatal: true }).decode(bytes) };
  } catch {
    return { ok: false, reason: "The file is not UTF-8 text (perhaps Latin-1 or Windows-1252). Save it as CSV UTF-8 and upload it again." };
  }
}
