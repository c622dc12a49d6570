// "Where the numbers come from": the one page that says, for every value the predictions and checks
// use, its source, or that it is a rule of thumb or an estimate not yet checked. Other pages link here.
import type { Metadata } from "next";
import type { ReactNode } from "react";
import { PageShell } from "@/components/PageShell";
import { PageTitle } from "@/components/PageTitle";
import { BACKGROUND_PRESET_SPECS, BACKGROUND_PRESETS } from "@/lib/acoustics/background";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { instrumentProvenance } from "@/lib/acoustics/provenance";
import { requireSignedIn } from "@/lib/auth/page-session";
import { DEFAULT_EAR_HEIGHT_M } from "@/lib/field/point-words";
import { plainSource } from "@/lib/sources/plain-source";
import { TARGET_FIELDS } from "../shows/[showId]/targets/target-fields";
import { BETWEEN_SURFACES, FIELD_SURFACES, POINT_SURROUNDINGS } from "../shows/[showId]/settings/choices";

export const metadata: Metadata = { title: "Where the numbers come from" };

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section id={id} aria-labelledby={`${id}-title`} className="rounded-xl border border-ink/10 bg-paper-raised p-5 shadow-sm">
      <h2 id={`${id}-title`} className="mb-3 text-xl font-semibold text-ink">
        {title}
      </h2>
      {children}
    </section>
  );
}

function Rows({ rows }: { rows: { what: string; source: string }[] }) {
  return (
    <dl className="grid gap-x-4 gap-y-2 sm:grid-cols-[minmax(12rem,1fr)_2fr]">
      {rows.map((r) => (
        <div key={r.what} className="contents">
          <dt className="font-semibold text-ink">{r.what}</dt>
          <dd className="text-ink-soft">{plainSource(r.source)}</dd>
        </div>
      ))}
    </dl>
  );
}

export default async function SourcesPage() {
  const user = await requireSignedIn("/sources");
  // Each ground once (grass is offered for the field, the ground between and around a point).
  const grounds = [...new Map([...FIELD_SURFACES, ...BETWEEN_SURFACES, ...POINT_SURROUNDINGS].filter((c) => c.g !== null).map((c) => [c.label, c])).values()];
  return (
    <PageShell userName={user.name}>
      <PageTitle sub="Every value the predictions and the balance checks use, and where it comes from. Levels Farfield shows are predictions, not measurements; readings taken at the box narrow them.">
        Where the numbers come from
      </PageTitle>
      <div className="space-y-6">
        <Section id="field" title="The field and the step">
          <Rows
            rows={[
              { what: "The field", source: "360 × 160 ft, goal line to goal line 100 yards, 53 1/3 yards wide (football field rules)." },
              { what: "A step", source: "8 to 5: 5 yards in 8 steps, 22.5 in. Common practice, no source." },
              { what: "High-school hashes", source: "53 ft 4 in from each sideline, the field in thirds (the rules of high school football)." },
              { what: "College hashes", source: "60 ft from each sideline, 40 ft apart (the rules of college football)." },
              { what: "A listener's ears", source: `${DEFAULT_EAR_HEIGHT_M} m above the ground when no height is given; common practice, no source.` },
            ]}
          />
        </Section>
        <Section id="thresholds" title="Balance targets (defaults)">
          <Rows rows={TARGET_FIELDS.map((f) => ({ what: f.label, source: f.basis }))} />
        </Section>
        <Section id="instruments" title="Instruments">
          <p className="mb-3 text-ink-soft">Each instrument&apos;s loudness at every dynamic, its tone and how it spreads its sound. A program that adopts a fit of its box readings replaces these for its shows (the Box readings page says so per instrument).</p>
          <Rows
            rows={Object.values(DEFAULT_INSTRUMENTS).map((spec) => {
              const p = instrumentProvenance(spec);
              return { what: spec.name, source: `${p.text}; about ±${p.uncertaintyDb} dB at a listening point.` };
            })}
          />
        </Section>
        <Section id="ground" title="Ground">
          <Rows rows={grounds.map((c) => ({ what: c.label, source: c.source }))} />
        </Section>
        <Section id="background" title="Background noise">
          <Rows rows={BACKGROUND_PRESETS.map((k) => ({ what: BACKGROUND_PRESET_SPECS[k].label, source: BACKGROUND_PRESET_SPECS[k].source }))} />
        </Section>
        <Section id="hearing" title="Hearing">
          <Rows
            rows={[
              { what: "85 dBA for 8 hours, 3 dB exchange rate", source: "NIOSH 98-126 (1998), recommended exposure limit." },
              { what: "90 dBA for 8 hours, 5 dB exchange rate", source: "OSHA 29 CFR 1910.95, permissible exposure limit (Table G-16)." },
            ]}
          />
          <p className="mt-3 text-sm text-ink-soft">Estimates for cautions only: local rules and licensed audiologists decide.</p>
        </Section>
      </div>
    </PageShell>
  );
}
