// The optional show filter of the fit routes: readings of one show of the program, or all.
import { z } from "zod";

export const fitScopeSchema = z.object({ showId: z.string().uuid("showId must be a show's id.").optional() });
