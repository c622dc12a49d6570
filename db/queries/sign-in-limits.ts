// Sign-in counters (table sign_in_limits): reserved atomically before a password is checked.
import { inArray, lt, and, sql } from "drizzle-orm";
import { db } from "../client";
import { signInLimits } from "../schema";

/**
 * One counter: at most `max` failures per window of `windowSeconds` (counted from the window's first
 * failure); with `slowDown`, from failure `after` on each attempt must also wait `firstSeconds`, then
 * twice that, and so on up to `maxSeconds`, after the one before.
 */
export interface LimitRule {
  key: string;
  max: number;
  windowSeconds: number;
  slowDown?: { after: number; firstSeconds: number; maxSeconds: number };
}

class Refused extends Error {
  constructor(readonly rule: LimitRule, readonly retryAfterSeconds: number) {
    super("refused");
  }
}

// clock_timestamp(), not now(): now() is when the transaction began, so an attempt that waited for another's
// row lock would compare against a time before that other attempt's, and be refused for nothing.
function reserveOne(tx: Pick<typeof db, "execute">, r: LimitRule) {
  const expired = sql`l.window_started_at <= clock_timestamp() - make_interval(secs => ${r.windowSeconds})`;
  const failures = sql`case when ${expired} then 1 else l.failures + 1 end`;
  const slow = r.slowDown;
  const delay = (n: ReturnType<typeof sql>) =>
    slow
      ? sql`case when ${n} < ${slow.after} then 0 else least(${slow.firstSeconds} * power(2, ${n} - ${slow.after}), ${slow.maxSeconds}) end`
      : sql`0`;
  return tx.execute<{ failures: number }>(sql`
    insert into sign_in_limits as l (key, failures, window_started_at, next_allowed_at)
    values (${r.key}, 1, clock_timestamp(), clock_timestamp() + make_interval(secs => ${delay(sql`1`)}))
    on conflict (key) do update set
      failures = ${failures},
      window_started_at = case when ${expired} then clock_timestamp() else l.window_started_at end,
      next_allowed_at = clock_timestamp() + make_interval(secs => ${delay(failures)})
    where ${expired} or (l.failures < ${r.max} and l.next_allowed_at <= clock_timestamp())
    returning failures`);
}

async function waitSeconds(tx: Pick<typeof db, "execute">, r: LimitRule): Promise<number> {
  const [row] = await tx.execute<{ wait: number }>(sql`
    select extract(epoch from greatest(
      next_allowed_at,
      case when failures >= ${r.max} then window_started_at + make_interval(secs => ${r.windowSeconds}) else clock_timestamp() end
    ) - clock_timestamp())::float8 as wait
    from sign_in_limits where key = ${r.key}`);
  return Math.max(1, Math.ceil(row?.wait ?? 1));
}

/**
 * Counts one attempt against every rule in one transaction, as a failure until `releaseAttempt` says
 * otherwise: either all counters take it, or none does and the answer names the rule that refused and
 * how long to wait. Keys are locked in sorted order, so concurrent attempts cannot deadlock.
 */
export async function reserveAttempt(rules: LimitRule[]): Promise<{ refused: LimitRule; retryAfterSeconds: number } | null> {
  const sorted = [...rules].sort((a, b) => (a.key < b.key ? -1 : 1));
  try {
    await db.transaction(async (tx) => {
      for (const r of sorted) {
        const rows = await reserveOne(tx, r);
        if (rows.length === 0) throw new Refused(r, await waitSeconds(tx, r));
      }
    });
    return null;
  } catch (err) {
    if (err instanceof Refused) return { refused: err.rule, retryAfterSeconds: err.retryAfterSeconds };
    throw err;
  }
}

/** A right password: the attempt was no failure after all for `keep` (one taken back), and `clear` start afresh. */
export async function releaseAttempt(keep: string[], clear: string[]): Promise<void> {
  await db.transaction(async (tx) => {
    if (keep.length) {
      await tx
        .update(signInLimits)
        .set({ failures: sql`greatest(${signInLimits.failures} - 1, 0)` })
        .where(inArray(signInLimits.key, keep));
    }
    if (clear.length) await tx.delete(signInLimits).where(inArray(signInLimits.key, clear));
  });
}

/** Drops counters whose window and delay are long over. */
export async function pruneLimits(before: Date): Promise<void> {
  await db.delete(signInLimits).where(and(lt(signInLimits.windowStartedAt, before), lt(signInLimits.nextAllowedAt, before)));
}
