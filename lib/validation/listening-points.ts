// A listening point as the API takes it (shared/API.md): metres in the field frame, z up.
import { z } from "./zod";

/** A listening point may lie at most this far from the 50-yard line on the front sideline, and this high. */
export const LISTENING_POINT_REACH_M = 300;
export const LISTENING_POINT_MAX_HEIGHT_M = 100;

const coordinate = (what: string, min: number, max: number, where: string) =>
  z.number({ error: `${what} must be a number.` }).refine((v) => Number.isFinite(v) && v >= min && v <= max, `${what} ${where}`);

export const listeningPointSchema = z
  .object({
    name: z.string().trim().min(1, "Name the listening point.").max(120, "That name is too long."),
    x: coordinate("x", -LISTENING_POINT_REACH_M, LISTENING_POINT_REACH_M, `must be within ${LISTENING_POINT_REACH_M} m of the 50-yard line.`),
    y: coordinate("y", -LISTENING_POINT_REACH_M, LISTENING_POINT_REACH_M, `must be within ${LISTENING_POINT_REACH_M} m of the front sideline.`),
    z: coordinate("z", 0, LISTENING_POINT_MAX_HEIGHT_M, `must be 0 to ${LISTENING_POINT_MAX_HEIGHT_M} m above the field.`),
  })
  .strict();
