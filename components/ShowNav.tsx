"use client";
// The pages of one show, on every show page: the current one marked, large targets; on a phone
// they fold into one menu. The field editor link opens the first set (read from the shared show key).
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { ShowResponse } from "./api-types";
import { apiKeys, useApi } from "./use-api";

const PAGES: { path: string; label: string }[] = [
  { path: "", label: "Overview" },
  { path: "/sets", label: "Field editor" },
  { path: "/music", label: "Music" },
  { path: "/timeline", label: "Timeline" },
  { path: "/compare", label: "Compare" },
  { path: "/readings", label: "Box readings" },
  { path: "/hearing", label: "Hearing map" },
  { path: "/rehearsal", label: "Stadium rehearsal" },
  { path: "/sheets", label: "Coordinate sheets" },
  { path: "/imports", label: "Imports" },
  { path: "/targets", label: "Balance targets" },
  { path: "/settings", label: "Settings" },
];

export function ShowNav({ showId }: { showId: string }) {
  const pathname = usePathname() ?? "";
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const base = `/shows/${encodeURIComponent(showId)}`;
  const firstSet = show.data?.sets[0]?.id;
  const here = pathname.replace(/\/$/, "");

  const items = PAGES.map(({ path, label }) => {
    const href = path === "/sets" ? (firstSet ? `${base}/sets/${encodeURIComponent(firstSet)}` : null) : `${base}${path}`;
    const current = path === "" ? here === base : here === `${base}${path}` || here.startsWith(`${base}${path}/`);
    return { label, href, current };
  });
  const currentLabel = items.find((i) => i.current)?.label;
  const links = (cls: string) =>
    items.map(({ label, href, current }) => (
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
    ));

  return (
    <nav aria-label="Show pages" className="no-print mb-4">
      {/* On a phone the pages fold into one menu, so the page's own content starts near the top. */}
      <details className="sm:hidden">
        <summary className="flex min-h-11 cursor-pointer items-center rounded-lg border border-ink-soft/40 bg-paper-raised px-3 font-semibold">
          Show pages{currentLabel ? `: ${currentLabel}` : ""}
        </summary>
        <ul className="mt-1 grid grid-cols-2 gap-1">{links("flex min-h-11 items-center rounded-lg border px-2 text-sm font-semibold")}</ul>
      </details>
      <ul className="hidden flex-wrap gap-1 sm:flex">{links("inline-flex min-h-11 items-center rounded-lg border px-1.5 text-sm font-semibold")}</ul>
    </nav>
  );
}
