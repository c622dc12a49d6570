// A new show as the program page creates it, and the conditions a show keeps.
import { groundFactorSchema } from "./listening-points";
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
    groundFactor: groundFactorSchema.nullable(),
    /** G of the ground between the field and the listening points (track, aprons); null: the field's. */
    betweenGroundFactor: groundFactorSchema.nullable().optional(),
  })
  .strict();

/** A movement of the show: its name and the set it starts at (it runs to the next movement's first set). */
export const movementSchema = z
  .object({
    name: z.string().trim().min(1, "Name the movement.").max(160, "That name is too long."),
    firstSetId: z.string().uuid("firstSetId must be a set's id."),
  })
  .strict();

/** PATCH /api/shows/{id}: any of the show's settings; movements replace the show's list. */
export const updateShowSchema = z
  .object({
    name: createShowSchema.shape.name,
    fieldRules: z.enum(["high-school", "college"], { error: "Field rules are high-school or college." }),
    conditions: conditionsSchema.partial().strict(),
    movements: z.array(movementSchema).max(50, "At most 50 movements."),
  })
  .partial()
  .strict()
  .refine((b) => Object.keys(b).length > 0, { message: "Give at least one setting to change.", path: ["(body)"] });

/** Deleting a show asks for its name, typed, so a slip of the mouse deletes nothing. */
export const deleteShowSchema = z.object({ name: z.string({ error: "Type the show's name to delete it." }).max(200) }).strict();

export const archiveShowSchema = z.object({ archived: z.boolean({ error: "archived is true or false." }) }).strict();

export const duplicateShowSchema = z.object({ name: createShowSchema.shape.name.optional() }).strict();
