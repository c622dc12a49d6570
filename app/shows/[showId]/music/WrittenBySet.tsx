"use client";
// Every set's written dynamic per section, as the phrases give them: the music at a glance, filled in or not.
import { Card } from "@/components/Card";
import { phraseAt } from "@/lib/music/voicing";
import type { MusicResponse } from "./music-types";

export function WrittenBySet({ music }: { music: MusicResponse }) {
  const orderOf = new Map(music.sets.map((s) => [s.id, s.order]));
  const phrases = music.phrases.map((p) => ({ ...p, firstOrder: orderOf.get(p.firstSetId) ?? 0, lastOrder: orderOf.get(p.lastSetId) ?? 0 }));
  const sets = [...music.sets].sort((a, b) => a.order - b.order);
  return (
    <Card title="Written dynamics, set by set" titleId="written-by-set-title">
      <p className="mb-2 text-sm text-ink-soft">Each section&rsquo;s written dynamic at every set, from the phrase that covers it; &ldquo;rest&rdquo; where the section is tacet, &ldquo;—&rdquo; where no phrase covers the set.</p>
      <div className="overflow-x-auto">
        <table className="border-collapse text-left text-sm" data-testid="written-by-set">
          <thead>
            <tr className="border-b border-ink/15 text-ink-soft">
              <th scope="col" className="py-1 pr-3">Set</th>
              <th scope="col" className="py-1 pr-3">Phrase</th>
              {music.sections.map((s) => <th key={s.name} scope="col" className="py-1 pr-3">{s.name}</th>)}
            </tr>
          </thead>
          <tbody>
            {sets.map((set) => {
              const phrase = phraseAt(phrases, set.order);
              return (
                <tr key={set.id} className="border-b border-ink/5">
                  <th scope="row" className="py-1 pr-3">{set.number}</th>
                  <td className="py-1 pr-3 whitespace-nowrap">{phrase?.name ?? "—"}</td>
                  {music.sections.map((s) => {
                    const a = phrase ? music.assignments.find((x) => x.phraseId === phrase.id && x.section === s.name) : undefined;
                    return (
                      <td key={s.name} className="py-1 pr-3">
                        {!phrase ? "—" : !a || a.voice === "tacet" ? <span className="text-ink-faint">rest</span> : <span className="font-semibold">{a.writtenDynamic}</span>}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </Card>
  );
}
