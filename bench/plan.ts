// Benchmark of the balance plan (run: npx tsx bench/plan.ts against a database with the demo loaded).
// Prints readable figures, then as its last line one JSON object:
//   planMs     median time of the phrase plan of the demo's largest phrase at the press box, as the plan route
//              computes it (the solve, and each set's mix and checks before and after), the show already read
//   plan300Ms  median solve of a generated phrase: 300 performers in 15 sections over 3 sets, at a press box
//   plan300Nodes, plan300Proven  the branch and bound's nodes and whether it proved its plan best there
//   planCpuMs, plan300CpuMs  the same medians in CPU time of this process (a shared machine's load stretches the wall clock)
import { eq } from "drizzle-orm";
import { db, sql } from "@/db/client";
import { shows } from "@/db/schema";
import { DYNAMICS, solveBalancePlan, type AnalysisInput, type Dynamic, type PerformerInput, type Voice } from "@/lib/acoustics";
import { planProblem } from "@/lib/acoustics/plan";
import { searchPlan } from "@/lib/acoustics/plan-search";
import { phrasePlan } from "@/lib/analysis/phrase-plan";
import { loadShowBalance } from "@/lib/analysis/show-context";

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[xs.length >> 1]!;
/** Median wall and CPU time (ms) of one call, after 5 unmeasured ones. */
function time(fn: () => void, samples = 25): [wall: number, cpu: number] {
  for (let i = 0; i < 5; i++) fn();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let s = 0; s < samples; s++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return [median(wall), median(cpu)];
}

// Deterministic generator (mulberry32) so every run measures the same band.
let seed = 20261202;
function rand(): number {
  seed = (seed + 0x6d2b79f5) | 0;
  let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
  t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
}

/** 15 sections of 20 players: an arrangement's voicing with dynamics around mf. */
const SECTIONS: [string, string, Voice][] = [
  ["piccolo", "Piccolos", "countermelody"],
  ["flute", "Flutes", "countermelody"],
  ["clarinet", "Clarinets", "melody"],
  ["bass-clarinet", "Bass Clarinets", "bass"],
  ["alto-sax", "Alto Saxes", "accompaniment"],
  ["tenor-sax", "Tenor Saxes", "accompaniment"],
  ["bari-sax", "Bari Saxes", "bass"],
  ["trumpet", "Trumpets", "melody"],
  ["mellophone", "Mellophones", "accompaniment"],
  ["trombone", "Trombones", "accompaniment"],
  ["baritone", "Baritones", "countermelody"],
  ["tuba", "Tubas", "bass"],
  ["snare", "Snares", "percussion"],
  ["bass-drum", "Bass Drums", "percussion"],
  ["marimba", "Front Ensemble", "accompaniment"],
];
function generatedPhrase(): AnalysisInput[] {
  const written = SECTIONS.map(() => DYNAMICS[2 + Math.floor(rand() * 3)] as Dynamic);
  return [0, 1, 2].map(() => ({
    performers: SECTIONS.flatMap(([instrument, section, voice], s) =>
      Array.from({ length: 20 }, (_, n): PerformerInput => ({
        id: `${section}-${n}`,
        instrument,
        section,
        voice,
        dynamic: written[s]!,
        x: rand() * 80 - 40,
        y: voice === "percussion" ? rand() * 5 : rand() * 45,
        facingDeg: rand() < 0.8 ? 0 : rand() * 360,
        strengthDb: Math.round(rand() * 6 - 3),
      })),
    ),
    listeningPoints: [{ id: "box", x: 0, y: -25, z: 18 }],
    conditions: { temperatureC: 24, relativeHumidityPct: 55, pressureKPa: 101.325, groundFactor: 1 },
  }));
}

async function main() {
  const [show] = await db.select().from(shows).where(eq(shows.name, "Lanterns on the Water")).limit(1);
  if (!show) throw new Error("the demo show is not loaded");
  const sb = await loadShowBalance(show);
  const box = sb.listeningPoints.find((l) => l.name === "Press box") ?? sb.listeningPoints[0]!;
  const setsOf = (p: (typeof sb.music.phrases)[number]) => sb.sets.filter((s) => s.order >= p.firstOrder && s.order <= p.lastOrder && s.positions.length > 0);
  const largest = [...sb.music.phrases].sort((a, b) => setsOf(b).length - setsOf(a).length || a.firstOrder - b.firstOrder)[0]!;
  const [planMs, planCpuMs] = time(() => phrasePlan(sb, largest.id, box.id));
  console.log(`demo phrase "${largest.name}" (${setsOf(largest).length} sets) at the ${box.name}: ${planMs.toFixed(1)} ms (median; CPU ${planCpuMs.toFixed(1)} ms)`);

  const inputs = generatedPhrase();
  const [plan300Ms, plan300CpuMs] = time(() => solveBalancePlan(inputs, "box"), 15);
  const problem = planProblem(inputs, "box");
  const search = searchPlan(problem.model, problem.change);
  console.log(`300 performers, 15 sections, 3 sets: ${plan300Ms.toFixed(1)} ms (median; CPU ${plan300CpuMs.toFixed(1)} ms); ${search.nodes} nodes, proven best: ${search.proven}`);

  await sql.end();
  const r1 = (v: number) => Math.round(v * 10) / 10;
  console.log(JSON.stringify({ planMs: r1(planMs), plan300Ms: r1(plan300Ms), planCpuMs: r1(planCpuMs), plan300CpuMs: r1(plan300CpuMs), plan300Nodes: search.nodes, plan300Proven: search.proven }));
}

main().catch(async (err) => {
  console.error(err);
  await sql.end();
  process.exit(1);
});
