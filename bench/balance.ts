// Benchmark of the balance work on the demo (run: npx tsx bench/balance.ts against a database with the demo loaded).
// Prints readable figures, then as its last line one JSON object:
//   showSweepStoreMs      whole-show sweep of the demo (every set, every count, every listening point, checks at each),
//                         read, computed and stored in PostgreSQL, nothing stored before (median of 3)
//   recomputeAfterEditMs  the same call after one performer moved in one set: only the changed sets recomputed (median of 3)
import { and, eq, inArray } from "drizzle-orm";
import { db, sql } from "@/db/client";
import { listStoredSweeps, storeSweeps } from "@/db/queries/sweeps";
import { balanceSweeps, positions, shows, sets } from "@/db/schema";
import { loadShowBalance } from "@/lib/analysis/show-context";
import { showSweeps, type SweepStore } from "@/lib/analysis/show-sweeps";

const store: SweepStore = { list: listStoredSweeps, save: storeSweeps };
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[xs.length >> 1]!;

async function timed<T>(fn: () => Promise<T>): Promise<[number, T]> {
  const t0 = performance.now();
  const out = await fn();
  return [performance.now() - t0, out];
}

async function main() {
  const [show] = await db.select().from(shows).where(eq(shows.name, "Lanterns on the Water")).limit(1);
  if (!show) throw new Error("the demo show is not loaded");
  const setIds = (await db.select({ id: sets.id }).from(sets).where(eq(sets.showId, show.id))).map((s) => s.id);
  const clear = () => db.delete(balanceSweeps).where(inArray(balanceSweeps.setId, setIds));
  const sweepAll = async () => showSweeps(await loadShowBalance(show), store);

  const cold: number[] = [];
  let first: Awaited<ReturnType<typeof sweepAll>> | null = null;
  for (let i = 0; i < 3; i++) {
    await clear();
    const [ms, r] = await timed(sweepAll);
    cold.push(ms);
    first ??= r;
  }
  const sb = await loadShowBalance(show);
  const samples = first!.sweeps.reduce((n, s) => n + Object.values(s.points).reduce((m, l) => m + l.length, 0), 0);
  console.log(`demo: ${sb.sets.length} sets, ${sb.roster.length} performers, ${sb.listeningPoints.length} listening point(s), ${samples} samples (count × point), each with the box mix and six checks`);
  console.log(`whole-show sweep, computed and stored: ${cold.map((m) => m.toFixed(0)).join(", ")} ms (first run includes JIT warm-up)`);

  const [reuseMs, reused] = await timed(sweepAll);
  console.log(`whole-show sweep, all stored and reused: ${reuseMs.toFixed(0)} ms (recomputed ${reused.recomputed})`);

  // One performer moved in one set (a direct position update), then put back.
  const target = sb.sets[Math.floor(sb.sets.length / 2)]!;
  const p = target.positions[0]!;
  const move = (x: number) => db.update(positions).set({ x }).where(and(eq(positions.performerId, p.performerId), eq(positions.setId, target.id)));
  const edits: number[] = [];
  let recomputed = 0;
  for (let i = 0; i < 3; i++) {
    await move(p.x + 1 + i);
    const [ms, r] = await timed(sweepAll);
    edits.push(ms);
    recomputed = r.recomputed;
  }
  await move(p.x);
  await sweepAll();
  console.log(`after moving one performer in set ${target.number}: ${edits.map((m) => m.toFixed(0)).join(", ")} ms, ${recomputed} of ${sb.sets.length} sets recomputed (the set and the transition out of it)`);

  await sql.end();
  console.log(JSON.stringify({ showSweepStoreMs: Math.round(median(cold)), showSweepFirstRunMs: Math.round(cold[0]!), showSweepReuseMs: Math.round(reuseMs), recomputeAfterEditMs: Math.round(median(edits)), setsRecomputedAfterEdit: recomputed }));
}

main().catch(async (err) => {
  console.error(err);
  await sql.end();
  process.exit(1);
});
