"use client";
// One SWR key per resource URL, shared by every component that reads it (and by mutate).
import useSWR, { type SWRResponse } from "swr";
import { ApiError, fetcher } from "./fetcher";

export { apiKeys } from "./api-keys";

/** Reads a GET route handler; pass null to wait (dependent keys). Errors that will not change are not retried. */
export function useApi<T>(key: string | null) {
  return useSWR<T, ApiError>(key, fetcher<T>, {
    shouldRetryOnError: (err: Error) => !(err instanceof ApiError) || err.status === 0 || err.status >= 500,
    errorRetryCount: 3,
  });
}

export type ApiState<T> = SWRResponse<T, ApiError>;
