// A generated 300-performer show for load figures, written straight through the db layer.
import { randomUUID } from "node:crypto";
import { db } from "@/db/client";
import { instrumentCatalogs, listeningPoints, memberships, performers, positions, programs, sets, shows, users } from "@/db/schema";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics";
import { hashPassword } from "@/lib/auth/password";

const MIX = ["trumpet", "mellophone", "trombone", "baritone", "tuba", "clarinet", "flute", "alto-sax", "snare", "bass-drum"];

export async function createLargeShow(opts: { performers: number; sets: number }) {
  const email = `bench-${Date.now()}@bench.example`;
  const password = "bench-password-1";
  return db.transaction(async (tx) => {
    const userId = randomUUID();
    await tx.insert(users).values({ id: userId, email, name: "Bench Runner", passwordHash: await hashPassword(password) });
    const [program] = await tx.insert(programs).values({ name: "Bench Program" }).returning();
    await tx.insert(memberships).values({ programId: program!.id, userId, role: "director" });
    await tx.insert(instrumentCatalogs).values({ programId: program!.id, version: 1, instruments: DEFAULT_INSTRUMENTS });
    const [show] = await tx
      .insert(shows)
      .values({ programId: program!.id, name: "Bench Show", temperatureC: 24, relativeHumidityPct: 55, groundFactor: 0 })
      .returning();
    const [box] = await tx.insert(listeningPoints).values({ showId: show!.id, name: "Press box", x: 0, y: -25, z: 18 }).returning();
    const roster = await tx
      .insert(performers)
      .values(
        Array.from({ length: opts.performers }, (_, i) => {
          const instrument = MIX[i % MIX.length]!;
          return { showId: show!.id, label: `P${i + 1}`, instrument, section: instrument, part: "1" };
        }),
      )
      .returning({ id: performers.id });
    const setRows = await tx
      .insert(sets)
      .values(Array.from({ length: opts.sets }, (_, i) => ({ showId: show!.id, number: String(i + 1), counts: 16, order: i })))
      .returning({ id: sets.id });
    for (const [s, set] of setRows.entries()) {
      await tx.insert(positions).values(
        roster.map((p, i) => ({
          setId: set.id,
          performerId: p.id,
          x: -45 + (i % 30) * 3 + s * 0.1,
          y: 4 + Math.floor(i / 30) * 3.5,
          facingDeg: 0,
        })),
      );
    }
    return { email, password, showId: show!.id, setIds: setRows.map((s) => s.id), listeningPointId: box!.id, performerIds: roster.map((p) => p.id) };
  });
}
