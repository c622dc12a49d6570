// The key to the marks on the sheets (paper and screen print the same words). Pure.

/** Under every set's picture. */
export const MARK_KEY = "Each wedge points where the performer faces, as wide as the instrument throws its sound (narrow for brass bells, wide for woodwinds, all round for drums).";
