// A second, small program (invented) so tests can show that one program sees nothing of another.
import { row } from "./geometry";
import type { DemoPerformer, DemoPosition, DemoProgram } from "./types";

const PERFORMERS: DemoPerformer[] = [
  { label: "T1", instrument: "trumpet", section: "Trumpets", part: "1st", strengthDb: 0, name: "Ruth Calloway" },
  { label: "T2", instrument: "trumpet", section: "Trumpets", part: "2nd", strengthDb: 0, name: "Sam Oduya" },
  { label: "M1", instrument: "mellophone", section: "Mellophones", part: "", strengthDb: 0, name: "Ines Varga" },
  { label: "B1", instrument: "baritone", section: "Baritones", part: "", strengthDb: 0, name: "Colin Freer" },
  { label: "TU1", instrument: "tuba", section: "Tubas", part: "sousaphone", strengthDb: 0, name: "Abel Marquez" },
  { label: "S1", instrument: "snare", section: "Snares", part: "", strengthDb: 0, name: "Lottie Brandt" },
];

function positionsOnRow(y: number): Record<string, DemoPosition> {
  const dots = row(0, y, PERFORMERS.length, 2);
  return Object.fromEntries(PERFORMERS.map((p, i) => [p.label, { x: dots[i].x, y: dots[i].y, facingDeg: 0 }]));
}

export const WESTBROOK_DIRECTOR = "director@westbrook.example";

export const WESTBROOK: DemoProgram = {
  name: "Westbrook Academy Band",
  members: [{ email: WESTBROOK_DIRECTOR, name: "Helen Achterberg", role: "director" }],
  shows: [
    {
      name: "Northern Signals",
      fieldRules: "college",
      conditions: { temperatureC: 18, relativeHumidityPct: 70, pressureKPa: 101.325, groundFactor: 0 },
      listeningPoints: [{ name: "Press box", x: 0, y: -20, z: 15 }],
      performers: PERFORMERS,
      movements: [{ number: 1, name: "Opener" }],
      sets: [
        { number: "1", counts: 0, movement: 1, positions: positionsOnRow(20) },
        { number: "2", counts: 16, movement: 1, positions: positionsOnRow(15) },
      ],
      phrases: [
        {
          name: "Opening call",
          firstSet: "1",
          lastSet: "2",
          sections: {
            Trumpets: { voice: "melody", dynamic: "f" },
            Mellophones: { voice: "countermelody", dynamic: "mf" },
            Baritones: { voice: "accompaniment", dynamic: "mf" },
            Tubas: { voice: "bass", dynamic: "f" },
            Snares: { voice: "percussion", dynamic: "mf" },
          },
          overrides: [],
        },
      ],
    },
  ],
};
