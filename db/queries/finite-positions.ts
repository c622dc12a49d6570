// The one rule every reader of stored positions applies: a row whose x, y or facing is not a finite
// number (stored before migration 0007's CHECK, or by hand) is left out, so its performer counts as
// unplaced in that set, as if the drill had not placed them, instead of every analysis, sheet and
// export of the show failing on it.
import { sql } from "drizzle-orm";
import { positions } from "../schema";

/** True for a position row whose coordinates and facing are all finite (a NaN or ±Infinity makes the sum no finite number). */
export const finitePosition = sql`abs(${positions.x}) + abs(${positions.y}) + abs(${positions.facingDeg}) < 'Infinity'::float8`;
