// Harbor Ridge's music (invented): nine phrases over the 18 sets, each section's voice and
// written dynamic, with a trumpet solo and two players laying out.
import type { Dynamic, VoiceOrTacet } from "@/lib/acoustics/types";
import type { DemoPhrase, DemoVoice } from "./types";

const WOODWINDS = ["Flutes", "Clarinets", "Alto Saxes", "Tenor Sax", "Bari Sax"];
const BRASS = ["Trumpets", "Mellophones", "Trombones", "Baritones", "Tubas"];
const BATTERY = ["Snares", "Tenors", "Bass Drums", "Cymbals"];
const ALL_SECTIONS = [...WOODWINDS, ...BRASS, ...BATTERY, "Front Ensemble"];

const v = (voice: VoiceOrTacet, dynamic: Dynamic): DemoVoice => ({ voice, dynamic });
// The written dynamic is required by the table; for a tacet section it is not played.
const TACET = v("tacet", "p");

/** Every section at once, the named ones changed. */
function voicing(base: DemoVoice, changes: Record<string, DemoVoice>): Record<string, DemoVoice> {
  for (const s of Object.keys(changes)) if (!ALL_SECTIONS.includes(s)) throw new Error(`unknown section ${s}`);
  return Object.fromEntries(ALL_SECTIONS.map((s) => [s, changes[s] ?? base]));
}
const each = (sections: string[], voice: DemoVoice) => Object.fromEntries(sections.map((s) => [s, voice]));

export const HARBOR_RIDGE_PHRASES: DemoPhrase[] = [
  {
    name: "Fanfare",
    firstSet: "1",
    lastSet: "2",
    sections: voicing(v("accompaniment", "mf"), {
      Trumpets: v("melody", "f"),
      Mellophones: v("melody", "f"),
      Baritones: v("countermelody", "mf"),
      Flutes: v("countermelody", "mf"),
      "Tenor Sax": v("countermelody", "mf"),
      Tubas: v("bass", "f"),
      "Bari Sax": v("bass", "mf"),
      ...each(BATTERY, v("percussion", "f")),
      "Front Ensemble": v("percussion", "mf"),
    }),
    overrides: [],
  },
  {
    name: "Harbor theme",
    firstSet: "3",
    lastSet: "5",
    sections: voicing(v("accompaniment", "mp"), {
      "Alto Saxes": v("melody", "mf"),
      Mellophones: v("melody", "mf"),
      Flutes: v("countermelody", "mp"),
      Baritones: v("countermelody", "mf"),
      Tubas: v("bass", "mf"),
      "Bari Sax": v("bass", "mf"),
      Snares: v("percussion", "mp"),
      Tenors: v("percussion", "mp"),
      "Bass Drums": v("percussion", "mp"),
      Cymbals: TACET,
      "Front Ensemble": v("percussion", "mp"),
    }),
    overrides: [],
  },
  {
    name: "First impact",
    firstSet: "6",
    lastSet: "6",
    sections: voicing(v("melody", "ff"), {
      Trumpets: v("melody", "fff"),
      Flutes: v("countermelody", "ff"),
      Trombones: v("countermelody", "ff"),
      Tubas: v("bass", "ff"),
      "Bari Sax": v("bass", "ff"),
      ...each(BATTERY, v("percussion", "ff")),
      Cymbals: v("percussion", "fff"),
      "Front Ensemble": v("percussion", "ff"),
    }),
    overrides: [],
  },
  // The ballad: the clarinets sing p over a p brass chorale, the case the balance plan must fix. The
  // clarinets stand deep and carry poorly, so the director lets the plan move the winds up to four steps here.
  {
    name: "Clarinet song",
    planLimits: { windSteps: 4 },
    firstSet: "7",
    lastSet: "8",
    sections: voicing(TACET, {
      Clarinets: v("melody", "p"),
      Trumpets: v("accompaniment", "p"),
      Mellophones: v("accompaniment", "p"),
      Trombones: v("accompaniment", "p"),
      Baritones: v("accompaniment", "p"),
      Tubas: v("bass", "p"),
      "Alto Saxes": v("accompaniment", "p"),
      "Tenor Sax": v("accompaniment", "p"),
      "Bari Sax": v("bass", "p"),
      "Bass Drums": v("percussion", "pp"),
      "Front Ensemble": v("accompaniment", "pp"),
    }),
    overrides: [],
  },
  {
    name: "Trumpet solo",
    firstSet: "9",
    lastSet: "10",
    sections: voicing(TACET, {
      Clarinets: v("accompaniment", "pp"),
      Flutes: v("accompaniment", "pp"),
      Mellophones: v("accompaniment", "pp"),
      Baritones: v("accompaniment", "pp"),
      Tubas: v("bass", "pp"),
      "Front Ensemble": v("accompaniment", "p"),
    }),
    overrides: [{ label: "T1", voice: "melody", dynamic: "mf", note: "Solo; the rest of the trumpets rest." }],
  },
  {
    name: "Swell",
    firstSet: "11",
    lastSet: "11",
    sections: voicing(v("accompaniment", "mf"), {
      Trombones: v("melody", "f"),
      Baritones: v("melody", "f"),
      Mellophones: v("countermelody", "f"),
      ...each(WOODWINDS, v("countermelody", "f")),
      Tubas: v("bass", "f"),
      "Bari Sax": v("bass", "f"),
      ...each(BATTERY, v("percussion", "mf")),
      "Front Ensemble": v("percussion", "mf"),
    }),
    overrides: [],
  },
  {
    name: "Procession",
    firstSet: "12",
    lastSet: "13",
    sections: voicing(TACET, {
      Snares: v("melody", "ff"),
      Tenors: v("countermelody", "ff"),
      "Bass Drums": v("bass", "ff"),
      Cymbals: v("percussion", "f"),
      ...each(BRASS, v("accompaniment", "mf")),
      Tubas: v("bass", "mf"),
      "Front Ensemble": v("percussion", "f"),
    }),
    overrides: [],
  },
  {
    name: "Lanterns rise",
    firstSet: "14",
    lastSet: "15",
    sections: voicing(v("accompaniment", "mf"), {
      Flutes: v("melody", "f"),
      Clarinets: v("melody", "f"),
      "Alto Saxes": v("melody", "f"),
      "Tenor Sax": v("countermelody", "f"),
      "Bari Sax": v("bass", "f"),
      Trumpets: v("countermelody", "mf"),
      Mellophones: v("countermelody", "mf"),
      Tubas: v("bass", "f"),
      ...each(BATTERY, v("percussion", "mf")),
      "Front Ensemble": v("percussion", "mf"),
    }),
    overrides: [{ label: "TB6", voice: "tacet", dynamic: "mf", note: "Lays out to make the long crossing into the wedge." }],
  },
  {
    name: "Finale",
    firstSet: "16",
    lastSet: "17",
    sections: voicing(v("melody", "ff"), {
      Trombones: v("countermelody", "ff"),
      Baritones: v("countermelody", "ff"),
      Flutes: v("countermelody", "ff"),
      Tubas: v("bass", "ff"),
      "Bari Sax": v("bass", "ff"),
      ...each(BATTERY, v("percussion", "ff")),
      Cymbals: v("percussion", "fff"),
      "Front Ensemble": v("percussion", "ff"),
    }),
    overrides: [{ label: "PC1", voice: "tacet", dynamic: "ff", note: "Piccolo lays out in the final chord." }],
  },
];
