import { createHash } from "node:crypto";
import { NextResponse } from "next/server";
import { z } from "zod";
import { insertReadings } from "@/db/queries/readings";
import { requireShow } from "@/lib/auth/access";
import { badRequest, conflict, tooLarge } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { parseReadingsCsv } from "@/lib/readings/csv";
import { showRefs } from "@/lib/readings/show-refs";
import { MAX_CSV_BYTES, MAX_CSV_ROWS } from "@/lib/validation/readings";

const bodySchema = z.object({
  csv: z.string({ error: "csv must be the file's text." }),
  /** The token of the preview being confirmed; absent for a preview. */
  confirm: z.string().optional(),
});

const tokenOf = (csv: string) => createHash("sha256").update(csv).digest("hex");

/**
 * A CSV of readings: without `confirm`, a preview of every row (nothing stored) and a token; with
 * the preview's token, stores every row in one transaction (400 if any row is invalid, 409 if the
 * file changed since the preview).
 */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { user } = await requireShow(showId, "comment");
  const body = await readJson(req, bodySchema, MAX_CSV_BYTES + 4096);
  if (Buffer.byteLength(body.csv) > MAX_CSV_BYTES) throw tooLarge(`The file is larger than ${MAX_CSV_BYTES / 1024} KB.`);
  const { rows, headerErrors } = parseReadingsCsv(body.csv, await showRefs(showId));
  if (rows.length > MAX_CSV_ROWS) throw tooLarge(`At most ${MAX_CSV_ROWS} readings per upload; this file has ${rows.length}.`);
  const token = tokenOf(body.csv);
  const invalid = rows.filter((r) => r.errors.length);
  const preview = {
    token,
    rows: rows.map((r) => ({ line: r.line, reading: r.reading, errors: r.errors })),
    valid: rows.length - invalid.length,
    invalid: invalid.length,
    headerErrors,
  };
  if (body.confirm === undefined) return NextResponse.json({ preview, stored: 0 });

  if (body.confirm !== token) throw conflict("The file changed since the preview; preview it again.");
  if (headerErrors.length || invalid.length || rows.length === 0) {
    const issues = Object.fromEntries([...headerErrors.map((e, i) => [`header.${i}`, [e]]), ...invalid.map((r) => [`line ${r.line}`, r.errors])]);
    throw badRequest(rows.length === 0 ? "The file holds no readings." : "Some rows are not valid; nothing was stored.", issues);
  }
  const ids = await insertReadings(rows.map((r) => ({ ...r.reading!, takenAt: new Date(r.reading!.takenAt), showId, recordedBy: user.id })));
  return NextResponse.json({ preview, stored: ids.length, ids }, { status: 201 });
});
