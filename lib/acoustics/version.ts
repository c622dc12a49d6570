/** Bumped whenever the engine's arithmetic or default catalog changes, so stored analyses are recomputed. */
export const MODEL_VERSION = "farfield-acoustics-6";
