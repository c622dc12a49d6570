// Harbor Ridge's roster (invented): 66 marching members and a front ensemble of 6.
import type { DemoPerformer } from "./types";

// Invented first and last names, paired by a fixed rule so every run gives the same roster.
const FIRST = [
  "Avery", "Jordan", "Maya", "Eli", "Sofia", "Noah", "Leah", "Mateo", "Grace", "Owen", "Nadia", "Caleb",
  "Iris", "Julian", "Hana", "Isaac", "Zoe", "Ruben", "Clara", "Theo", "Amara", "Lucas", "Tessa", "Kai",
  "Mira", "Dante", "Elise", "Rowan", "Priya", "Felix", "Lena", "Omar", "June", "Silas", "Nora", "Wes",
];
const LAST = [
  "Alvarez", "Brooks", "Chen", "Dawson", "Ellery", "Farrow", "Garza", "Holloway", "Ibarra", "Jensen", "Kowalski", "Lindqvist",
  "Moreau", "Nakamura", "Okafor", "Pryce", "Quinlan", "Ramos", "Sato", "Thornton", "Underhill", "Vance", "Whitaker", "Yates",
  "Ashby", "Bergstrom", "Castillo", "Delacroix", "Easton", "Fitzgerald", "Haddad", "Iverson", "Keller", "Marsh", "Novak", "Osei",
];
const nameFor = (i: number) =>
  `${FIRST[i % FIRST.length]} ${LAST[(i * 7 + 3 + 5 * Math.floor(i / FIRST.length)) % LAST.length]}`;

type Spec = [label: string, instrument: string, section: string, part: string, strengthDb?: number];

/** `prefix1…prefixN`, each with its part. */
function players(prefix: string, n: number, instrument: string, section: string, part: (i: number) => string): Spec[] {
  return Array.from({ length: n }, (_, k) => [`${prefix}${k + 1}`, instrument, section, part(k + 1)] as Spec);
}

const firstHalf = (n: number) => (i: number) => (i <= Math.ceil(n / 2) ? "1st" : "2nd");

// A few players differ from the norm: strong leads (+3), a very strong trumpet who sticks out
// at the box (+5), and some quieter players (−3).
const STRENGTH: Record<string, number> = { T1: 3, T2: 5, M1: 3, TB1: 3, F6: -3, C7: -3, A3: -3, B4: -3 };

const SPECS: Spec[] = [
  ...players("F", 6, "flute", "Flutes", firstHalf(6)),
  ["PC1", "piccolo", "Flutes", "piccolo"],
  ...players("C", 8, "clarinet", "Clarinets", (i) => (i <= 3 ? "1st" : i <= 6 ? "2nd" : "3rd")),
  ["BC1", "bass-clarinet", "Clarinets", "bass clarinet"],
  ...players("A", 4, "alto-sax", "Alto Saxes", firstHalf(4)),
  ...players("TS", 2, "tenor-sax", "Tenor Sax", () => ""),
  ["BS1", "bari-sax", "Bari Sax", ""],
  ...players("T", 10, "trumpet", "Trumpets", (i) => (i <= 4 ? "1st" : i <= 7 ? "2nd" : "3rd")),
  ...players("M", 6, "mellophone", "Mellophones", firstHalf(6)),
  ...players("TB", 6, "trombone", "Trombones", (i) => (i <= 2 ? "1st" : i <= 4 ? "2nd" : "3rd")),
  ...players("B", 4, "baritone", "Baritones", firstHalf(4)),
  ...players("TU", 5, "tuba", "Tubas", () => "sousaphone"),
  ...players("S", 4, "snare", "Snares", (i) => (i === 2 ? "center snare" : "")),
  ...players("TD", 2, "tenors", "Tenors", () => "quints"),
  ...players("BD", 4, "bass-drum", "Bass Drums", (i) => `bass ${i}`),
  ...players("CY", 2, "cymbals", "Cymbals", () => ""),
  ...players("MA", 3, "marimba", "Front Ensemble", (i) => `marimba ${i}`),
  ...players("V", 2, "vibraphone", "Front Ensemble", (i) => `vibraphone ${i}`),
  ["SY1", "synth", "Front Ensemble", "synthesizer"],
];

export const HARBOR_RIDGE_PERFORMERS: DemoPerformer[] = SPECS.map(([label, instrument, section, part], i) => ({
  label,
  instrument,
  section,
  part,
  strengthDb: STRENGTH[label] ?? 0,
  name: nameFor(i),
}));

const labelsOf = (section: string) => HARBOR_RIDGE_PERFORMERS.filter((p) => p.section === section).map((p) => p.label);

/** The groups the drill moves together, each in a fixed order (side 1 to side 2 in lines and arcs). */
export const GROUPS = {
  woodwinds: ["Flutes", "Clarinets", "Alto Saxes", "Tenor Sax", "Bari Sax"].flatMap(labelsOf),
  brass: ["Trumpets", "Mellophones", "Trombones", "Baritones", "Tubas"].flatMap(labelsOf),
  battery: ["Snares", "Tenors", "Bass Drums", "Cymbals"].flatMap(labelsOf),
  frontEnsemble: labelsOf("Front Ensemble"),
  clarinets: labelsOf("Clarinets"),
};

export const SECTIONS = [...new Set(HARBOR_RIDGE_PERFORMERS.map((p) => p.section))];
