// A new show as the program page creates it, and the conditions a show keeps.
import { readingSchema } from "./readings";
import { z } from "./zod";

export const createShowSchema = z
  .object({
    name: z.string().trim().min(1, "Name the show.").max(160, "That name is too long."),
    fieldRules: z.enum(["high-school", "college"], { error: "Field rules are high-school or college." }).default("high-school"),
  })
  .strict();

/** The evening's air and ground as a show stores them; temperature and humidity as a reading takes them. */
export const conditionsSchema = z
  .object({
    temperatureC: readingSchema.shape.temperatureC,
    relativeHumidityPct: readingSchema.shape.relativeHumidityPct,
    pressureKPa: z
      .number({ error: "pressureKPa must be a number." })
      .refine((p) => Number.isFinite(p) && p >= 60 && p <= 110, "Air pressure must be between 60 and 110 kPa (sea level is 101.3)."),
    groundFactor: z
      .number({ error: "groundFactor must be a number." })
      .refine((g) => Number.isFinite(g) && g >= 0 && g <= 1, "The ground factor must be between 0 (hard) and 1 (grass).")
      .nullable(),
  })
  .strict();
