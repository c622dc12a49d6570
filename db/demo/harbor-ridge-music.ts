// Harbor Ridge's music (invented): ten phrases over the 18 sets, each section's voice and written
// dynamic, with a trumpet solo and two players laying out. As written it holds a few problems a
// director meets in a real season (README, "The demo show"): the clarinets' song buried under the
// brass (sets 7–8), the flutes' echo lost in the crowd (set 10), the back of the brass block turned
// away (set 13), the wedge's trumpet ends carrying (sets 14–15) and a strong trumpet standing out.
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
    sections: voicing(v("accompaniment", "f"), {
      Trumpets: v("melody", "f"),
      Mellophones: v("melody", "f"),
      Flutes: v("melody", "ff"),
      Clarinets: v("melody", "ff"),
      "Alto Saxes": v("accompaniment", "mf"),
      Baritones: v("countermelody", "ff"),
      "Tenor Sax": v("countermelody", "ff"),
      Trombones: v("accompaniment", "mf"),
      Tubas: v("bass", "ff"),
      "Bari Sax": v("bass", "ff"),
      ...each(BATTERY, v("percussion", "p")),
      "Front Ensemble": v("accompaniment", "f"),
    }),
    overrides: [],
  },
  {
    name: "Harbor theme",
    firstSet: "3",
    lastSet: "5",
    sections: voicing(v("accompaniment", "p"), {
      "Alto Saxes": v("melody", "f"),
      Mellophones: v("melody", "f"),
      "Tenor Sax": v("accompaniment", "mf"),
      Trombones: v("accompaniment", "mp"),
      Baritones: v("accompaniment", "mp"),
      Tubas: v("bass", "f"),
      "Bari Sax": v("bass", "f"),
      Snares: v("percussion", "pp"),
      Tenors: v("percussion", "pp"),
      "Bass Drums": v("percussion", "pp"),
      Cymbals: TACET,
      "Front Ensemble": v("accompaniment", "p"),
    }),
    overrides: [],
  },
  {
    name: "First impact",
    firstSet: "6",
    lastSet: "6",
    sections: voicing(v("melody", "ff"), {
      Trombones: v("accompaniment", "f"),
      Baritones: v("accompaniment", "f"),
      Tubas: v("bass", "fff"),
      "Bari Sax": v("bass", "ff"),
      ...each(BATTERY, v("percussion", "mp")),
      "Front Ensemble": v("accompaniment", "f"),
    }),
    overrides: [],
  },
  // The ballad: the clarinets sing p while the brass chorale is written mp, the case the balance plan
  // must fix. The clarinets stand deep and carry poorly, so the director lets the plan move the winds
  // up to four steps here.
  {
    name: "Clarinet song",
    planLimits: { windSteps: 4 },
    firstSet: "7",
    lastSet: "8",
    sections: voicing(TACET, {
      Clarinets: v("melody", "p"),
      Trumpets: v("accompaniment", "p"),
      Mellophones: v("accompaniment", "mp"),
      Trombones: v("accompaniment", "mp"),
      Baritones: v("accompaniment", "mp"),
      Tubas: v("bass", "f"),
      "Alto Saxes": v("accompaniment", "pp"),
      "Tenor Sax": v("accompaniment", "p"),
      "Bari Sax": v("bass", "mp"),
    }),
    overrides: [{ label: "T2", voice: "tacet", dynamic: "p", note: "Lays out of the chorale: too strong for it." }],
  },
  {
    name: "Trumpet solo",
    firstSet: "9",
    lastSet: "9",
    // The trumpets rest but for the soloist: the section's marking is the solo's.
    sections: voicing(TACET, {
      Trumpets: v("tacet", "mf"),
      "Alto Saxes": v("accompaniment", "p"),
      Mellophones: v("accompaniment", "p"),
      Baritones: v("accompaniment", "mp"),
      Tubas: v("bass", "mf"),
      "Front Ensemble": v("accompaniment", "p"),
    }),
    overrides: [{ label: "T1", voice: "melody", dynamic: "mf", note: "Solo; the rest of the trumpets rest." }],
  },
  // A quiet echo of the theme in the flutes alone: heard over the band, lost in the crowd.
  {
    name: "Flute echo",
    firstSet: "10",
    lastSet: "10",
    sections: voicing(TACET, {
      Flutes: v("melody", "p"),
      Tubas: v("bass", "pp"),
      "Front Ensemble": v("accompaniment", "pp"),
    }),
    overrides: [],
  },
  {
    name: "Swell",
    firstSet: "11",
    lastSet: "11",
    sections: voicing(v("accompaniment", "mp"), {
      Trombones: v("melody", "f"),
      Baritones: v("melody", "f"),
      Mellophones: v("countermelody", "mf"),
      "Tenor Sax": v("accompaniment", "mf"),
      Tubas: v("bass", "ff"),
      "Bari Sax": v("bass", "f"),
      ...each(BATTERY, v("percussion", "p")),
      "Front Ensemble": v("accompaniment", "mp"),
    }),
    overrides: [],
  },
  {
    name: "Procession",
    firstSet: "12",
    lastSet: "13",
    sections: voicing(TACET, {
      Snares: v("melody", "f"),
      Tenors: v("percussion", "f"),
      "Bass Drums": v("bass", "f"),
      Cymbals: v("percussion", "mf"),
      ...each(BRASS, v("accompaniment", "f")),
      Trumpets: v("accompaniment", "mf"),
      Tubas: v("bass", "fff"),
      "Front Ensemble": v("percussion", "mf"),
    }),
    overrides: [{ label: "T2", voice: "tacet", dynamic: "mf", note: "Changes to the flag line's cue for the drum feature." }],
  },
  {
    name: "Lanterns rise",
    firstSet: "14",
    lastSet: "15",
    sections: voicing(v("accompaniment", "mp"), {
      Flutes: v("melody", "ff"),
      Clarinets: v("melody", "ff"),
      "Alto Saxes": v("melody", "ff"),
      "Tenor Sax": v("countermelody", "f"),
      "Bari Sax": v("bass", "f"),
      Trumpets: v("accompaniment", "p"),
      Mellophones: v("countermelody", "mf"),
      Tubas: v("bass", "f"),
      ...each(BATTERY, v("percussion", "pp")),
      "Front Ensemble": v("accompaniment", "mp"),
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
      Tubas: v("bass", "fff"),
      "Bari Sax": v("bass", "ff"),
      ...each(BATTERY, v("percussion", "mf")),
      "Front Ensemble": v("melody", "ff"),
    }),
    overrides: [{ label: "PC1", voice: "tacet", dynamic: "ff", note: "Piccolo lays out in the final chord." }],
  },
];
