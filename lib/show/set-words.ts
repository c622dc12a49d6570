// Set numbers in words, singular or plural as people say them. Pure.

/** "Set 6", "Sets 6, 7 and 9" (no sets: ""). */
export function setListWords(numbers: readonly string[]): string {
  if (numbers.length === 0) return "";
  if (numbers.length === 1) return `Set ${numbers[0]}`;
  return `Sets ${numbers.slice(0, -1).join(", ")} and ${numbers[numbers.length - 1]}`;
}
