// Numbers and words as the pages print them.

/** "bass-drum" → "Bass drum". */
export function humanize(key: string): string {
  const words = key.replace(/[-_]+/g, " ").trim();
  return words ? words[0].toUpperCase() + words.slice(1) : key;
}

/** Signed decibels with a real minus sign: "+3 dB", "−6 dB", "0 dB". */
export function signedDb(db: number): string {
  const rounded = Math.round(db * 10) / 10;
  if (rounded === 0) return "0 dB";
  return `${rounded > 0 ? "+" : "−"}${Math.abs(rounded)} dB`;
}

/** Metres with one decimal and a real minus sign. */
export function metres(m: number): string {
  const s = (Math.round(m * 10) / 10).toFixed(1);
  return `${s.startsWith("-") ? "−" + s.slice(1) : s} m`;
}

export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}
