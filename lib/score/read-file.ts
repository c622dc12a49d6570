// The MusicXML text of an uploaded file: plain .musicxml/.xml, or compressed .mxl (a zip whose
// META-INF/container.xml names the score, W3C MusicXML 4.0 "container.xml" reference). Pure.
import { strFromU8, unzipSync } from "fflate";
import { MAX_SCORE_TEXT_BYTES } from "@/lib/limits";
import { ScoreError } from "./errors";
import { child, childrenNamed, parseXml } from "./xml-tree";

const isZip = (b: Uint8Array) => b.length > 3 && b[0] === 0x50 && b[1] === 0x4b && b[2] === 0x03 && b[3] === 0x04;

function unzip(bytes: Uint8Array): Record<string, Uint8Array> {
  let total = 0;
  try {
    return unzipSync(bytes, {
      // Read only what a score needs, and refuse a zip that would expand past the limit.
      filter: (f) => {
        if (f.name !== "META-INF/container.xml" && !/\.(xml|musicxml)$/i.test(f.name)) return false;
        total += f.originalSize;
        if (total > MAX_SCORE_TEXT_BYTES) throw new ScoreError(`The .mxl file expands past ${MAX_SCORE_TEXT_BYTES / 1_000_000} MB of score; export a smaller score.`);
        return true;
      },
    });
  } catch (err) {
    if (err instanceof ScoreError) throw err;
    throw new ScoreError("The .mxl file is not a readable zip archive; export it again from the notation program.");
  }
}

function decode(bytes: Uint8Array): string {
  // UTF-16 files start with a byte order mark; MusicXML is otherwise UTF-8.
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return new TextDecoder("utf-16le").decode(bytes);
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return new TextDecoder("utf-16be").decode(bytes);
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new ScoreError("The file is neither MusicXML text (UTF-8 or UTF-16) nor a compressed .mxl score.");
  }
}

/** The score's XML text from the uploaded bytes; ScoreError when it is not MusicXML in either form. */
export function scoreText(bytes: Uint8Array): string {
  if (!isZip(bytes)) return decode(bytes);
  const files = unzip(bytes);
  const container = files["META-INF/container.xml"];
  if (!container) throw new ScoreError("The .mxl file has no META-INF/container.xml, so its score cannot be found.");
  const rootfiles = childrenNamed(child(parseXml(strFromU8(container)), "rootfiles"), "rootfile");
  // The first rootfile is the score; later ones may be other renderings (MusicXML 4.0, rootfile).
  const path = rootfiles.find((r) => !r.attrs["media-type"] || r.attrs["media-type"] === "application/vnd.recordare.musicxml+xml")?.attrs["full-path"];
  const score = path ? files[path] : undefined;
  if (!score) throw new ScoreError("The .mxl file's container names no score file it holds.");
  return decode(score);
}
