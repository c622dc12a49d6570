// A set's positions as the API takes them (shared/API.md): metres in the field frame, facing in degrees.
import { uniqueBy } from "./unique";
import { z } from "./zod";

/** Positions may lie at most this far beyond a sideline or end line (shared/API.md). */
export const FIELD_MARGIN_M = 10;
export const HALF_LENGTH_M = 54.864; // 60 yd from the 50 to the back of the end zone
export const WIDTH_M = 48.768; // 53 1/3 yd

const finite = (what: string) =>
  z.number({ error: `${what} must be a number.` }).refine(Number.isFinite, `${what} must be a finite number.`);

export const positionSchema = z.object({
  performerId: z.string().uuid("performerId must be a performer's id."),
  x: finite("x").refine((x) => Math.abs(x) <= HALF_LENGTH_M + FIELD_MARGIN_M, "x is off the field area (more than 10 m beyond an end line)."),
  y: finite("y").refine((y) => y >= -FIELD_MARGIN_M && y <= WIDTH_M + FIELD_MARGIN_M, "y is off the field area (more than 10 m beyond a sideline)."),
  facingDeg: finite("facingDeg").transform((d) => ((d % 360) + 360) % 360),
});

export const savePositionsSchema = z.object({
  version: z.number().int().min(1),
  positions: z
    .array(positionSchema)
    .max(2000, "At most 2000 positions per save.")
    .superRefine(uniqueBy((p) => p.performerId, (p) => `Performer ${p.performerId} is listed twice; give one position per performer.`)),
});

export type SavePositionsBody = z.infer<typeof savePositionsSchema>;
