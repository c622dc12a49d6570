// Which parts sound under the solo and mute buttons of sections and voices.

export interface SoloMute {
  soloSections: readonly string[];
  mutedSections: readonly string[];
  soloVoices: readonly string[];
  mutedVoices: readonly string[];
}

export const NO_SOLO_MUTE: SoloMute = { soloSections: [], mutedSections: [], soloVoices: [], mutedVoices: [] };

/**
 * Keys of the parts that sound. With any solo pressed only soloed sections and voices sound (a part sounds
 * when its section or its voice is soloed); a muted section or voice is silent either way (common practice
 * of mixing desks, no source).
 */
export function audibleParts(parts: readonly { key: string; section: string; voice: string }[], s: SoloMute): Set<string> {
  const anySolo = s.soloSections.length > 0 || s.soloVoices.length > 0;
  return new Set(
    parts
      .filter((p) => !anySolo || s.soloSections.includes(p.section) || s.soloVoices.includes(p.voice))
      .filter((p) => !s.mutedSections.includes(p.section) && !s.mutedVoices.includes(p.voice))
      .map((p) => p.key),
  );
}
