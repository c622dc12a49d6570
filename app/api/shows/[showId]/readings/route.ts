import { NextResponse } from "next/server";
import { findReading, insertReadings, listReadings } from "@/db/queries/readings";
import { requireShow } from "@/lib/auth/access";
import { badRequest } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { referenceIssues, showRefs } from "@/lib/readings/show-refs";
import { readingSchema } from "@/lib/validation/readings";
import { readingDto } from "./reading-dto";

/** The show's box readings, newest first. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { user } = await requireShow(showId, "read");
  const readings = await listReadings(showId);
  return NextResponse.json({ readings: readings.map((r) => readingDto(r, user.id)) });
});

/** Records one reading (staff and up). */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { user } = await requireShow(showId, "comment");
  const body = await readJson(req, readingSchema, 20_000);
  const issues = referenceIssues(body, await showRefs(showId));
  if (Object.keys(issues).length) throw badRequest("The reading refers to something this show does not have.", issues);
  const [id] = await insertReadings([{ ...body, takenAt: new Date(body.takenAt), showId, recordedBy: user.id }]);
  const reading = await findReading(showId, id!);
  return NextResponse.json({ reading: readingDto(reading!, user.id) }, { status: 201 });
});
