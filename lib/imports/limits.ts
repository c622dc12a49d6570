// How much one upload may hold; past these the upload is refused with 413.
export const MAX_UPLOAD_BYTES = 1_000_000;
export const MAX_ROSTER_ROWS = 1_000;
export const MAX_DRILL_ROWS = 20_000;
