// How the sheets page draws a show's sheets: the first few arrive with the page (its server
// component preloads just those), the rest follow in batches. A plain module: the server page reads it.
export const FIRST_SHEETS = 4;
export const SHEETS_PER_BATCH = 6;
