// The field rules in words, as pages and sheets print them. Pure.
import type { FieldRules } from "./geometry";

// Hash distances from the sidelines: high school 53 ft 4 in, college 60 ft (shared references).
export const FIELD_RULES_WORDS: Record<FieldRules, { name: string; hashes: string; sheet: string }> = {
  "high-school": { name: "High school", hashes: "Hashes 53 ft 4 in from each sideline (the field in thirds).", sheet: "High-school hashes (53 ft 4 in from each sideline)" },
  college: { name: "College", hashes: "Hashes 60 ft from each sideline (40 ft apart).", sheet: "College hashes (60 ft from each sideline)" },
};
