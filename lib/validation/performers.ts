// The body of "add performers by instrument" (POST /api/shows/{showId}/performers).
import { z } from "./zod";

const text = (max: number) => z.string().trim().max(max);

export const addPerformersSchema = z
  .object({
    instrument: z.string().trim().min(1, "Choose an instrument.").max(40),
    count: z.number().int().min(1).max(50).default(1),
    section: text(60).min(1).optional(),
    part: text(40).default(""),
    /** Only with count 1; else labels continue the roster's (T11, T12…). */
    label: text(12).regex(/^[A-Za-z]{1,4}\d{0,3}$/, "A label is letters and a number, e.g. T11.").optional(),
    strengthDb: z.number().min(-6).max(6).default(0),
  })
  .refine((b) => b.label === undefined || b.count === 1, { message: "A label can be given for one performer only.", path: ["label"] });
