"use client";
// The pages of one show, on every show page: the current one marked, large targets; on a phone
// they fold into one menu. The field editor link opens the first set (read from the shared show key).
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { ShowResponse } from "./api-types";
import { apiKeys, useApi } from "./use-api";

// `short`: the label in the row of tabs on wider screens, so the twelve pages stay on one row at 1366 px
// and the field editor's drawing fits a laptop's screen; the phone menu and page titles keep the full words.
const PAGES: { path: string; label: string; short?: string }[] = [
  { path: "", label: "Overview" },
  { path: "/sets", label: "Field editor" },
  { path: "/music", label: "Music" },
  { path: "/timeline", label: "Timeline" },
  { path: "/compare", label: "Compare" },
  { path: "/readings", label: "Box readings" },
  { path: "/hearing", label: "Hearing map" },
  { path: "/rehearsal", label: "Stadium rehearsal", short: "Rehearsal" },
  { path: "/sheets", label: "Coordinate sheets", short: "Sheets" },
  { path: "/imports", label: "Imports" },
  { path: "/targets", label: "Balance targets", short: "Targets" },
  { path: "/settings", label: "Settings" },
];

export function ShowNav({ showId }: { showId: string }) {
  const pathname = usePathname() ?? "";
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const base = `/shows/${encodeURIComponent(showId)}`;
  const firstSet = show.data?.sets[0]?.id;
  const here = pathname.replace(/\/$/, "");

  const items = PAGES.map(({ path, label, short }) => {
    const href = path === "/sets" ? (firstSet ? `${base}/sets/${encodeURIComponent(firstSet)}` : null) : `${base}${path}`;
    const current = path === "" ? here === base : here === `${base}${path}` || here.startsWith(`${base}${path}/`);
    return { label, short: short ?? label, href, current };
  });
  const currentLabel = items.find((i) => i.current)?.label;
  const links = (cls: string, wide = false) =>
    items.map(({ label: full, short, href, current }) => {
      const label = wide ? short : full;
      return (
      <li key={label}>
        {current ? (
          <Link href={here} aria-current="page" className={`${cls} border-turf-dark bg-turf-dark text-white`}>
            {label}
          </Link>
        ) : href ? (
          <Link href={href} prefetch={false} className={`${cls} border-ink-soft/40 bg-paper-raised text-turf-dark hover:border-ink`}>
            {label}
          </Link>
        ) : (
          // No set yet (or the show is loading): nothing to open in the editor.
          <span className={`${cls} border-ink/10 text-ink-faint`} aria-disabled="true">
            {label}
          </span>
        )}
      </li>
      );
    });

  return (
    <nav aria-label="Show pages" className="no-print mb-4">
      {/* On a phone the pages fold into one menu, so the page's own content starts near the top. */}
      <details className="sm:hidden">
        <summary className="flex min-h-11 cursor-pointer items-center rounded-lg border border-ink-soft/40 bg-paper-raised px-3 font-semibold">
          Show pages{currentLabel ? `: ${currentLabel}` : ""}
        </summary>
        <ul className="mt-1 grid grid-cols-2 gap-1">{links("flex min-h-11 items-center rounded-lg border px-2 text-sm font-semibold")}</ul>
      </details>
      <ul className="hidden flex-wrap gap-1 sm:flex">{links("inline-flex min-h-11 items-center rounded-lg border px-1.5 text-sm font-semibold", true)}</ul>
    </nav>
  );
}
