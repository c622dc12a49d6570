"use client";
// One SWR key per resource URL, shared by every component that reads it (and by mutate).
import useSWR, { type SWRResponse } from "swr";
import { ApiError, fetcher } from "./fetcher";

export const apiKeys = {
  me: "/api/me",
  program: (programId: string) => `/api/programs/${encodeURIComponent(programId)}`,
  programShows: (programId: string) => `/api/programs/${encodeURIComponent(programId)}/shows`,
  show: (showId: string) => `/api/shows/${encodeURIComponent(showId)}`,
};

/** Reads a GET route handler; pass null to wait (dependent keys). Errors that will not change are not retried. */
export function useApi<T>(key: string | null) {
  return useSWR<T, ApiError>(key, fetcher<T>, {
    shouldRetryOnError: (err: Error) => !(err instanceof ApiError) || err.status === 0 || err.status >= 500,
    errorRetryCount: 3,
  });
}

export type ApiState<T> = SWRResponse<T, ApiError>;
