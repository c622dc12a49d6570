// The demo program (invented): Harbor Ridge High School Marching Band and its show.
import { readFileSync } from "node:fs";
import { HARBOR_RIDGE_SETS } from "./harbor-ridge-drill";
import { HARBOR_RIDGE_PHRASES } from "./harbor-ridge-music";
import { HARBOR_RIDGE_PERFORMERS } from "./harbor-ridge-roster";
import { LANTERNS_FILE, LANTERNS_PART_MAP } from "./lanterns-score";
import type { DemoProgram } from "./types";

export const HARBOR_RIDGE_DIRECTOR = "director@harbor-ridge.example";

export const HARBOR_RIDGE: DemoProgram = {
  name: "Harbor Ridge High School Marching Band",
  members: [
    { email: HARBOR_RIDGE_DIRECTOR, name: "Dana Whitfield", role: "director" },
    { email: "designer@harbor-ridge.example", name: "Marcus Oyelaran", role: "designer" },
    { email: "staff@harbor-ridge.example", name: "Priya Castellanos", role: "staff" },
  ],
  shows: [
    {
      name: "Lanterns on the Water",
      fieldRules: "high-school",
      // A September evening. The stadium has natural grass, which ISO 9613-2 (7.3.1) counts as
      // porous ground, G = 1; artificial turf's porosity varies with its infill, so G = 0 would be a guess.
      conditions: { temperatureC: 24, relativeHumidityPct: 55, pressureKPa: 101.325, groundFactor: 1 },
      listeningPoints: [
        // During a performance the crowd talks at about 55 dBA at the box (the preset's level, from memory).
        { name: "Press box", x: 0, y: -25, z: 18, background: { preset: "crowd-during-performance" } },
        { name: "Front-row judge", x: 0, y: -8, z: 3 },
      ],
      performers: HARBOR_RIDGE_PERFORMERS,
      movements: [
        { number: 1, name: "Harbor Lights" },
        { number: 2, name: "Still Water" },
        { number: 3, name: "Lantern Procession" },
      ],
      sets: HARBOR_RIDGE_SETS,
      phrases: HARBOR_RIDGE_PHRASES,
      // The show's own arrangement, confirmed: set 1 on the downbeat of measure 1, after the pickup.
      score: {
        fileName: "lanterns-on-the-water.musicxml",
        content: readFileSync(LANTERNS_FILE),
        partMap: LANTERNS_PART_MAP,
        anchor: { set: "1", measure: "1", beat: 1 },
      },
    },
  ],
};
