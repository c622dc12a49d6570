// Numbers and words as the pages print them.

/** Signed decibels with a real minus sign: "+3 dB", "−6 dB", "0 dB". */
export function signedDb(db: number): string {
  const rounded = Math.round(db * 10) / 10;
  if (rounded === 0) return "0 dB";
  return `${rounded > 0 ? "+" : "−"}${Math.abs(rounded)} dB`;
}

export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}
