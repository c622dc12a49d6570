"use client";
// Coordinate sheets on screen and on paper: a sheet per performer (every set in the trade's words) or a sheet per set (the whole field).
import { FIELD_RULES_WORDS } from "@/lib/field/rules-words";
import { useEffect, useId, useState } from "react";
import { flushSync } from "react-dom";
import Link from "next/link";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Button, buttonClass } from "@/components/Button";
import { ErrorState } from "@/components/ErrorState";
import { plural } from "@/components/format";
import { NextStepNotice } from "@/components/NextStepNotice";
import { PageTitle } from "@/components/PageTitle";
import { useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import type { FieldRules } from "@/lib/field/geometry";
import type { BareSet, PerformerSheet, SetSheet } from "@/lib/sheets/coordinates";
import { MARK_KEY } from "@/lib/sheets/mark-key";
import { FieldDrawing, MySpot, SetBands } from "./FieldDrawing";
import { showKeys } from "@/components/api-keys";
import { FIRST_SHEETS, SHEETS_PER_BATCH } from "./sheet-batches";

type Sheets = {
  programName: string;
  show: { id: string; name: string; fieldRules: FieldRules };
  performers: PerformerSheet[];
  /** With words per set; bare dots on the performer view. */
  sets: (SetSheet | BareSet)[];
  performerCount: number;
  setCount: number;
};


export function SheetsView({ showId, by }: { showId: string; by: "performers" | "sets" }) {
  const opening = useApi<Sheets>(showKeys.sheets(showId, by, FIRST_SHEETS));
  const whole = useApi<Sheets>(showKeys.sheets(showId, by));
  const sheets = whole.data || !opening.data ? whole : opening;
  const wholeCount = by === "performers" ? opening.data?.performerCount : opening.data?.setCount;
  const bands = `sheets${useId().replace(/[^A-Za-z0-9]/g, "")}`;
  // A show's performer sheets are thousands of elements: the first few arrive with the page, the rest
  // follow in batches so the page is usable at once; printing first draws them all.
  const total = (by === "performers" ? sheets.data?.performers.length : sheets.data?.sets.length) ?? 0;
  const [shown, setShown] = useState(FIRST_SHEETS);
  useEffect(() => {
    if (shown >= total) return;
    const next = setTimeout(() => setShown((n) => n + SHEETS_PER_BATCH), 30);
    return () => clearTimeout(next);
  }, [shown, total]);
  useEffect(() => {
    const all = () => flushSync(() => setShown(Infinity));
    window.addEventListener("beforeprint", all);
    return () => window.removeEventListener("beforeprint", all);
  }, []);
  if (whole.error) return <ErrorState error={whole.error} what="show" onRetry={() => whole.mutate()} />;
  const data = sheets.data;
  const setsByNumber = new Map((data?.sets ?? []).map((s) => [s.number, s]));
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
        <PageTitle sub={`A step is 8 to 5 (22.5 in). ${data ? `${FIELD_RULES_WORDS[data.show.fieldRules].sheet}. ` : ""}Side 1 is on the left seen from the press box; inside means toward the 50.`}>Coordinate sheets</PageTitle>
        <NextStepNotice showId={showId} need="drill" />
        <div className="mb-6 flex flex-wrap items-center gap-3">
          {tab("performers", "A sheet per performer")}
          {tab("sets", "A sheet per set")}
          <Button
            variant="secondary"
            disabled={!whole.data}
            onClick={() => {
              flushSync(() => setShown(Infinity));
              window.print();
            }}
          >
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
          <SetBands rules={data.show.fieldRules} sets={data.sets} prefix={bands} />
          {data.performers.slice(0, shown).map((p) => (
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
                {p.part ? `, ${p.part}` : ""} · {p.instrumentName}
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
                      <td className="py-1">{r.facingWords}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              <ol className="mt-4 grid grid-cols-2 gap-3 sm:grid-cols-4" aria-label={`Where ${p.label} stands in each set`}>
                {p.rows.map((r) => {
                  const set = setsByNumber.get(r.set);
                  return set ? (
                    <li key={r.set} className="break-inside-avoid">
                      <p className="text-xs font-semibold">Set {r.set}</p>
                      <MySpot rules={data.show.fieldRules} set={set} mine={p.label} prefix={bands} title={`Set ${r.set}: ${p.label} among the band`} />
                    </li>
                  ) : null;
                })}
              </ol>
            </section>
          ))}
        </div>
      ) : (
        <div className="space-y-8">
          {(data.sets as SetSheet[]).slice(0, shown).map((s) => (
            <section key={s.number} className="print-sheet rounded-xl border border-ink/10 bg-paper-raised p-6" aria-labelledby={`set-${s.number}`}>
              <p className="text-sm text-ink-soft">
                {data.programName} · {data.show.name}
              </p>
              <h2 id={`set-${s.number}`} className="text-2xl font-bold text-ink">
                Set {s.number}
              </h2>
              <p className="text-ink-soft">
                {plural(s.counts, "count")} from the set before · {plural(s.dots.length, "performer")}
              </p>
              <div className="mt-3">
                <FieldDrawing rules={data.show.fieldRules} dots={s.dots} title={`Set ${s.number}: every dot on the field`} />
                <p className="mt-1 text-xs text-ink-soft">{MARK_KEY}</p>
              </div>
              <ul className="mt-3 columns-1 gap-6 text-xs leading-5 sm:columns-2 print:columns-2 print:gap-3 print:text-[6.5pt] print:leading-[1.25]">
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
      {data && shown < (wholeCount ?? total) ? (
        <p role="status" className="no-print mt-6 text-ink-soft">
          Preparing the other {plural((wholeCount ?? total) - Math.min(shown, total), by === "performers" ? "sheet" : "set sheet")}…
        </p>
      ) : null}
    </>
  );
}
