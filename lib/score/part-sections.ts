// Which of the show's sections a score part most likely plays in, by the instrument its name
// says ("Trumpet in B♭ 1" → the trumpets). The director confirms or changes it. Pure.

// Instrument words onto one family word each (common practice, no source: the usual names and
// abbreviations on band parts).
const FAMILIES: [RegExp, string][] = [
  [/\b(piccolo|picc|flutes?|fl)\b/, "flute"],
  [/\bbass\s+clar/, "clarinet"],
  [/\b(clarinets?|clar|cl)\b/, "clarinet"],
  [/\b(alto\s*sax\w*|as)\b/, "alto"],
  [/\b(tenor\s*sax\w*|ts)\b/, "tenorsax"],
  [/\b(bari(tone)?\s*sax\w*|bs)\b/, "barisax"],
  [/\b(trumpets?|tpts?|cornets?|flugelhorns?)\b/, "trumpet"],
  [/\b(mellophones?|mellos?|horns?(\s+in\s+f)?|french\s+horns?)\b/, "mellophone"],
  [/\b(trombones?|tbns?|bones?)\b/, "trombone"],
  [/\b(baritones?|euphoniums?|euph|bar)\b/, "baritone"],
  [/\b(tubas?|sousaphones?|sousas?|contras?)\b/, "tuba"],
  [/\b(snares?(\s+drums?)?|sd)\b/, "snare"],
  [/\b(tenor\s*drums?|tenors|quads|quints|toms)\b/, "tenors"],
  [/\b(bass\s*drums?|basses|bd)\b/, "bassdrum"],
  [/\b(cymbals?|cyms?|crash)\b/, "cymbals"],
  [/\b(front\s+ensemble|pit|marimbas?|vibraphones?|vibes|xylophones?|glockenspiel|bells|timpani|synth\w*|keyboards?|aux\w*\s+perc\w*|mallets?)\b/, "front"],
];

function normal(text: string): string {
  return text
    .toLowerCase()
    .replace(/[♭♯]/g, " ")
    .replace(/\bin\s+[a-g]\b/g, " ")
    .replace(/[^a-z\s]/g, " ")
    .replace(/\s+/g, " ")
    .trim();
}

/** The family words `text` names ("trumpet", "front" …), most specific first. */
export function familiesOf(text: string): string[] {
  const t = normal(text);
  const out: string[] = [];
  let rest = ` ${t} `;
  for (const [re, family] of FAMILIES) {
    if (re.test(rest)) {
      if (!out.includes(family)) out.push(family);
      // "bass clarinet" is a clarinet, not a bass drum: take the matched words out.
      rest = rest.replace(re, " ");
    }
  }
  return out;
}

export interface SectionLike {
  name: string;
  /** Instrument keys of its players ("trumpet", "bass-drum"). */
  instruments: string[];
}

/** The section a part named `partName` most likely plays in, or null when no section's name or instruments match. */
export function suggestSection(partName: string, sections: readonly SectionLike[]): string | null {
  const wanted = familiesOf(partName)[0];
  if (!wanted) return null;
  // A section's own name speaks first; its players' instruments next.
  const byName = sections.find((s) => familiesOf(s.name)[0] === wanted);
  if (byName) return byName.name;
  const byInstrument = sections.find((s) => s.instruments.some((i) => familiesOf(i.replace(/-/g, " "))[0] === wanted));
  return byInstrument?.name ?? null;
}
