// MusicXML text as a small ordered element tree (fast-xml-parser keeps document order, which the
// measure's cursor needs: notes, backups and directions are read in sequence). Pure.
import { XMLParser, XMLValidator } from "fast-xml-parser";
import { ScoreError } from "./errors";

export interface XmlElement {
  name: string;
  attrs: Record<string, string>;
  children: XmlElement[];
  text: string;
}

const parser = new XMLParser({
  preserveOrder: true,
  ignoreAttributes: false,
  attributeNamePrefix: "",
  parseTagValue: false,
  parseAttributeValue: false,
  trimValues: true,
  // Part names carry numeric character references (B&#9837;).
  htmlEntities: true,
});

type Raw = Record<string, unknown>;

function toElement(raw: Raw): XmlElement | null {
  const name = Object.keys(raw).find((k) => k !== ":@");
  if (!name || name === "#text" || name.startsWith("?") || name.startsWith("!")) return null;
  const kids = (raw[name] as Raw[]) ?? [];
  const children: XmlElement[] = [];
  let text = "";
  for (const k of kids) {
    if ("#text" in k) text += String(k["#text"]);
    else {
      const child = toElement(k);
      if (child) children.push(child);
    }
  }
  return { name, attrs: (raw[":@"] as Record<string, string>) ?? {}, children, text };
}

/** The document's root element; ScoreError when the text is not well-formed XML. */
export function parseXml(text: string): XmlElement {
  const valid = XMLValidator.validate(text);
  if (valid !== true) throw new ScoreError(`The file is not well-formed XML (line ${valid.err.line}: ${valid.err.msg}).`);
  let parsed: Raw[];
  try {
    parsed = parser.parse(text) as Raw[];
  } catch (err) {
    // The parser's own limits (entity expansion and the like) refuse a file rather than fail the request.
    throw new ScoreError(`The file could not be read as XML (${err instanceof Error ? err.message : "unreadable"}).`);
  }
  const roots = parsed.map(toElement).filter((e): e is XmlElement => e !== null);
  if (!roots[0]) throw new ScoreError("The file holds no XML element.");
  return roots[0];
}

/** The first child named `name`. */
export const child = (el: XmlElement | undefined, name: string) => el?.children.find((c) => c.name === name);
/** Every child named `name`. */
export const childrenNamed = (el: XmlElement | undefined, name: string) => el?.children.filter((c) => c.name === name) ?? [];
/** The text of the first child named `name` (empty when missing). */
export const childText = (el: XmlElement | undefined, name: string) => child(el, name)?.text ?? "";
/** The number in the first child named `name`, or null. */
export function childNumber(el: XmlElement | undefined, name: string): number | null {
  const t = childText(el, name);
  const n = t === "" ? NaN : Number(t);
  return Number.isFinite(n) ? n : null;
}
