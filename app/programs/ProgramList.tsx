"use client";
// The programs the signed-in user belongs to, each with their role in it.
import Link from "next/link";
import type { MeResponse } from "@/components/api-types";
import { EmptyState } from "@/components/EmptyState";
import { ErrorState } from "@/components/ErrorState";
import { PageTitle } from "@/components/PageTitle";
import { RoleBadge } from "@/components/RoleBadge";
import { SkeletonCard } from "@/components/Skeleton";
import { apiKeys, useApi } from "@/components/use-api";

export function ProgramList() {
  const { data, error, mutate } = useApi<MeResponse>(apiKeys.me);
  return (
    <>
      <PageTitle sub="Open a program to see its shows and its people.">Your programs</PageTitle>
      {error ? (
        <ErrorState error={error} what="program" onRetry={() => mutate()} />
      ) : !data ? (
        <SkeletonCard rows={2} label="Loading your programs…" />
      ) : data.memberships.length === 0 ? (
        <EmptyState title="You are not in any program yet">Ask a director to add you, or create an account with a program of your own.</EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2">
          {data.memberships.map((m) => (
            <li key={m.programId}>
              <Link
                href={`/programs/${m.programId}`}
                className="group flex min-h-24 flex-col justify-between gap-3 rounded-xl border border-ink/10 bg-paper-raised p-5 shadow-sm transition-colors hover:border-turf hover:bg-turf-light/40"
              >
                <span className="text-xl font-semibold text-ink group-hover:underline group-hover:underline-offset-4">{m.programName}</span>
                <span className="flex items-center gap-2 text-ink-soft">
                  Your role <RoleBadge role={m.role} />
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
