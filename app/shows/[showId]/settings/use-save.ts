"use client";
// One form's save: busy while sending, then a message in words (the API's own on a refusal), and the show re-read.
import { useState } from "react";
import { mutate } from "swr";
import { errorText } from "@/components/error-text";
import { ApiError } from "@/components/fetcher";
import { apiKeys } from "@/components/use-api";

export function useSave(showId: string) {
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string; issues?: Record<string, string[]> } | null>(null);
  const run = async (fn: () => Promise<unknown>, done: string) => {
    setBusy(true);
    setMessage(null);
    try {
      await fn();
      await mutate(apiKeys.show(showId));
      setMessage({ tone: "info", text: done });
      return true;
    } catch (err) {
      const issues = err instanceof ApiError ? err.issues : undefined;
      // Field errors say what is wrong better than the body's summary ("The request body is not valid.").
      const text = errorText(err, "That did not work.");
      setMessage({ tone: "bad", text: issues && Object.keys(issues).length ? `Not saved: ${text}` : text, issues });
      return false;
    } finally {
      setBusy(false);
    }
  };
  return { busy, message, run, clear: () => setMessage(null) };
}
