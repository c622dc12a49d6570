// The instruments a performer may play, as people name them, in score order (woodwinds, brass, battery, front ensemble). Pure.
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";

const FAMILY_ORDER = ["woodwind", "brass", "percussion", "keyboard", "amplified"];

export const INSTRUMENT_OPTIONS = Object.entries(DEFAULT_INSTRUMENTS)
  .map(([key, spec]) => ({ key, name: spec.name, family: spec.family as string }))
  .sort((a, b) => FAMILY_ORDER.indexOf(a.family) - FAMILY_ORDER.indexOf(b.family));

const NAMES = new Map(INSTRUMENT_OPTIONS.map((o) => [o.key, o.name]));

/** "Alto saxophone" for "alto-sax"; the key itself for an instrument the built-in catalog lacks. */
export function instrumentName(key: string): string {
  return NAMES.get(key) ?? key;
}
