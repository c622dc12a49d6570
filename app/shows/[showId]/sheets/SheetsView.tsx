"use client";
// Coordinate sheets on screen and on paper: a sheet per performer (every set in the trade's words) or a sheet per set (the whole field).
import Link from "next/link";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Button, buttonClass } from "@/components/Button";
import { ErrorState } from "@/components/ErrorState";
import { NextStepNotice } from "@/components/NextStepNotice";
import { PageTitle } from "@/components/PageTitle";
import { useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import type { FieldRules } from "@/lib/field/geometry";
import type { PerformerSheet, SetSheet } from "@/lib/sheets/coordinates";
import { FieldDrawing } from "./FieldDrawing";

type Sheets = { programName: string; show: { id: string; name: string; fieldRules: FieldRules }; performers: PerformerSheet[]; sets: SetSheet[] };

const RULES_WORDS: Record<FieldRules, string> = { "high-school": "high-school hashes (53 ft 4 in from each sideline)", college: "college hashes (60 ft from each sideline)" };

export function SheetsView({ showId, by }: { showId: string; by: "performers" | "sets" }) {
  const sheets = useApi<Sheets>(`/api/shows/${showId}/sheets`);
  if (sheets.error) return <ErrorState error={sheets.error} what="show" onRetry={() => sheets.mutate()} />;
  const data = sheets.data;
  const name = data?.show.name ?? "Show";
  const tab = (which: "performers" | "sets", label: string) => (
    <Link href={`/shows/${showId}/sheets?by=${which}`} aria-current={by === which ? "page" : undefined} className={buttonClass(by === which ? "primary" : "secondary")}>
      {label}
    </Link>
  );
  return (
    <>
      <div className="no-print">
        <Breadcrumbs items={[{ label: "Programs", href: "/programs" }, { label: name, href: `/shows/${showId}` }, { label: "Coordinate sheets" }]} />
        <ShowNav showId={showId} />
        <PageTitle sub={`Steps are 8 to 5 (22.5 in). ${data ? RULES_WORDS[data.show.fieldRules] : ""}. Side 1 is on the left seen from the press box.`}>Coordinate sheets</PageTitle>
        <NextStepNotice showId={showId} need="drill" />
        <div className="mb-6 flex flex-wrap items-center gap-3">
          {tab("performers", "A sheet per performer")}
          {tab("sets", "A sheet per set")}
          <Button variant="secondary" onClick={() => window.print()}>
            Print
          </Button>
          <a className={buttonClass("secondary")} href={`/api/shows/${showId}/sheets/pdf?by=${by}`}>
            PDF
          </a>
          <a className={buttonClass("quiet")} href={`/api/shows/${showId}/sheets/drill.csv`}>
            Drill CSV
          </a>
        </div>
      </div>
      {!data ? (
        <p role="status">Preparing the sheets…</p>
      ) : by === "performers" ? (
        <div className="space-y-8">
          {data.performers.map((p) => (
            <section key={p.label} className="print-sheet rounded-xl border border-ink/10 bg-paper-raised p-6" aria-labelledby={`sheet-${p.label}`}>
              <p className="text-sm text-ink-soft">
                {data.programName} · {data.show.name}
              </p>
              <h2 id={`sheet-${p.label}`} className="text-2xl font-bold text-ink">
                {p.label}
                {p.name ? ` — ${p.name}` : ""}
              </h2>
              <Link className="no-print text-sm text-turf-dark underline" href={`/shows/${showId}/performer/${encodeURIComponent(p.label)}`}>
                {p.label}&rsquo;s own page, with a picture per set (for a phone)
              </Link>
              <p className="text-ink-soft">
                {p.section}
                {p.part ? `, ${p.part}` : ""} · {p.instrument}
              </p>
              <table className="mt-3 w-full text-left">
                <thead>
                  <tr className="border-b-2 border-ink text-sm">
                    <th className="py-1 pr-3">Set</th>
                    <th className="py-1 pr-3">Counts</th>
                    <th className="py-1 pr-3">Side to side</th>
                    <th className="py-1 pr-3">Front to back</th>
                    <th className="py-1">Facing</th>
                  </tr>
                </thead>
                <tbody>
                  {p.rows.map((r) => (
                    <tr key={r.set} className="border-b border-ink/10 even:bg-paper-sunk/60">
                      <td className="py-1 pr-3 font-semibold">{r.set}</td>
                      <td className="py-1 pr-3">{r.counts}</td>
                      <td className="py-1 pr-3">{r.sideToSide}</td>
                      <td className="py-1 pr-3">{r.frontToBack}</td>
                      <td className="py-1">{r.facing}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </section>
          ))}
        </div>
      ) : (
        <div className="space-y-8">
          {data.sets.map((s) => (
            <section key={s.number} className="print-sheet rounded-xl border border-ink/10 bg-paper-raised p-6" aria-labelledby={`set-${s.number}`}>
              <p className="text-sm text-ink-soft">
                {data.programName} · {data.show.name}
              </p>
              <h2 id={`set-${s.number}`} className="text-2xl font-bold text-ink">
                Set {s.number} — {s.counts} counts
              </h2>
              <div className="mt-3">
                <FieldDrawing rules={data.show.fieldRules} dots={s.dots} title={`Set ${s.number}: every dot on the field`} />
              </div>
              <ul className="mt-3 columns-2 gap-6 text-xs leading-5 print:columns-3 print:gap-4 print:text-[6pt] print:leading-[1.2]">
                {s.dots.map((d) => (
                  <li key={d.label} className="break-inside-avoid">
                    <span className="font-semibold">{d.label}</span> {d.sideToSide}; {d.frontToBack}
                  </li>
                ))}
              </ul>
            </section>
          ))}
        </div>
      )}
    </>
  );
}
