// The checks whose targets the balance plan serves with section dynamics; the others are the drill's or
// one player's. Its own module so that pages can read it without loading the engine.
import type { CheckId } from "./types";

export const PLANNED_CHECKS = ["melody-forward", "battery-balance", "bass-up-pyramid", "heard-at-box"] as const satisfies readonly CheckId[];
