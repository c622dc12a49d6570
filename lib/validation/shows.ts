// A new show as the program page creates it.
import { z } from "./zod";

export const createShowSchema = z
  .object({
    name: z.string().trim().min(1, "Name the show.").max(160, "That name is too long."),
    fieldRules: z.enum(["high-school", "college"], { error: "Field rules are high-school or college." }).default("high-school"),
  })
  .strict();
