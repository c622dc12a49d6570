// Where this page sits: Programs › program › show. The last crumb is the current page.
import Link from "next/link";

export type Crumb = { label: string; href?: string };

export function Breadcrumbs({ items }: { items: Crumb[] }) {
  return (
    <nav aria-label="Breadcrumb" className="mb-4">
      <ol className="flex flex-wrap items-center gap-x-1 text-base text-ink-soft">
        {items.map((item, i) => {
          const last = i === items.length - 1;
          return (
            <li key={`${i}-${item.label}`} className="flex items-center gap-1">
              {item.href && !last ? (
                <Link href={item.href} className="inline-flex min-h-11 items-center rounded px-1 font-medium text-turf-dark underline-offset-4 hover:underline">
                  {item.label}
                </Link>
              ) : (
                <span aria-current={last ? "page" : undefined} className="inline-flex min-h-11 items-center px-1 font-semibold text-ink">
                  {item.label}
                </span>
              )}
              {!last ? <span aria-hidden="true" className="text-ink-faint">›</span> : null}
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
