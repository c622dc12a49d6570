"use client";
// A failed load in plain words: what happened and what to do, by the API's status code.
import { usePathname } from "next/navigation";
import { ApiError } from "./fetcher";
import { Button, ButtonLink } from "./Button";

type Props = { error: unknown; what?: string; onRetry?: () => void };

function describe(error: unknown, what: string): { title: string; body: string; retry: boolean; signIn?: boolean; home?: boolean } {
  const status = error instanceof ApiError ? error.status : -1;
  switch (status) {
    case 0:
      return { title: "No connection", body: "The server cannot be reached. Check the network and try again.", retry: true };
    case 401:
      return { title: "Signed out", body: "Your session has ended. Sign in again to continue.", retry: false, signIn: true };
    case 403:
      return { title: "Not allowed", body: "Your role in this program may not open this.", retry: false, home: true };
    case 404:
      return {
        title: `No such ${what}`,
        body: `We could not find this ${what}. It may have been removed, or it belongs to a program you are not a member of.`,
        retry: false,
        home: true,
      };
    case 503:
      return {
        title: "Database unavailable",
        body: "The database cannot be reached right now. Nothing is lost; try again in a moment.",
        retry: true,
      };
    default:
      return { title: "Something went wrong", body: error instanceof Error && error.message ? error.message : "The page could not be loaded.", retry: true };
  }
}

export function ErrorState({ error, what = "page", onRetry }: Props) {
  const pathname = usePathname();
  const info = describe(error, what);
  return (
    <div role="alert" className="rounded-xl border border-signal-bad/40 bg-paper-raised p-6 shadow-sm">
      <h2 className="text-lg font-semibold text-signal-bad">{info.title}</h2>
      <p className="mt-1 max-w-prose text-ink">{info.body}</p>
      <div className="mt-4 flex flex-wrap gap-3">
        {info.retry && onRetry ? <Button onClick={onRetry}>Try again</Button> : null}
        {info.signIn ? (
          <ButtonLink variant="primary" href={`/sign-in?next=${encodeURIComponent(pathname)}`}>
            Sign in
          </ButtonLink>
        ) : null}
        {info.home ? <ButtonLink href="/programs">Your programs</ButtonLink> : null}
      </div>
    </div>
  );
}
