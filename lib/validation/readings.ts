// A box reading as the API and the form take it: one schema for the form, the CSV rows and the server.
import { z } from "./zod";
import { DYNAMICS } from "@/lib/acoustics/types";

const finite = (what: string) => z.number({ error: `${what} must be a number.` }).refine(Number.isFinite, `${what} must be a finite number.`);

export const sectionPlayedSchema = z.object({
  section: z.string().trim().min(1, "Name the section.").max(80),
  dynamic: z.enum(DYNAMICS, { error: `The dynamic must be one of ${DYNAMICS.join(", ")}.` }),
});

export const readingSchema = z.object({
  setId: z.string().uuid("Choose the set that was played."),
  listeningPointId: z.string().uuid("Choose where the meter was."),
  takenAt: z.iso.datetime({ offset: true, error: "takenAt must be a date and time (ISO 8601)." }),
  temperatureC: finite("Temperature").refine((t) => t >= -20 && t <= 50, "Temperature must be between −20 and 50 °C."),
  relativeHumidityPct: finite("Humidity").refine((h) => h >= 10 && h <= 100, "Humidity must be between 10 and 100 %."),
  sections: z
    .array(sectionPlayedSchema)
    .min(1, "Name at least one section that played.")
    .max(40)
    .refine((list) => new Set(list.map((s) => s.section)).size === list.length, "Each section once."),
  measuredDb: finite("The measured level").refine((l) => l >= 30 && l <= 140, "The measured level must be between 30 and 140 dB."),
  weighting: z.enum(["A", "C"], { error: "Weighting must be A or C." }).default("A"),
  response: z.enum(["slow", "fast"], { error: "Response must be slow or fast." }).default("slow"),
  meterHeightM: finite("Meter height").refine((h) => h >= 0 && h <= 100, "Meter height must be between 0 and 100 m.").nullable().default(null),
  note: z.string().max(500).default(""),
});

export type ReadingBody = z.infer<typeof readingSchema>;
export type ReadingFormInput = z.input<typeof readingSchema>;

/** Most readings one CSV may hold. */
export const MAX_CSV_ROWS = 500;
/** Largest CSV accepted (bytes). */
export const MAX_CSV_BYTES = 256 * 1024;

/** The CSV columns, in the order of the template. */
export const CSV_COLUMNS = ["set", "point", "takenAt", "temperatureC", "humidityPct", "sections", "measuredDb", "weighting", "response", "meterHeightM", "note"] as const;
