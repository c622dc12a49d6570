"use client";
// The submit flow of a form that posts JSON with a password: validate with the shared schema, send,
// show the API's field errors and message, and never refill the password.
import { useRef, useState, type FormEvent } from "react";
import type { z } from "zod";
import { fieldIssues } from "@/lib/http/body";
import { ApiError, sendJson } from "./fetcher";

export function usePasswordForm<S extends z.ZodType, R>(opts: {
  schema: S;
  url: string;
  text: { pending: string; done: string; failed: string };
  onDone: (answer: R | null) => void;
  focusPasswordOnError?: boolean;
}) {
  const password = useRef<HTMLInputElement>(null);
  const [issues, setIssues] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState("");
  const [status, setStatus] = useState<"idle" | "pending" | "done">("idle");

  /** Submit handler for the form, given the fields other than the password. */
  const submitWith = (values: Record<string, string>) => async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const parsed = opts.schema.safeParse({ ...values, password: password.current?.value ?? "" });
    if (!parsed.success) {
      setIssues(fieldIssues(parsed.error));
      setMessage("Check the highlighted fields.");
      return;
    }
    setStatus("pending");
    setIssues({});
    setMessage(opts.text.pending);
    try {
      const answer = await sendJson<R>(opts.url, "POST", parsed.data);
      setStatus("done");
      setMessage(opts.text.done);
      opts.onDone(answer);
    } catch (err) {
      if (password.current) password.current.value = "";
      setStatus("idle");
      setIssues(err instanceof ApiError ? err.issues : {});
      setMessage(err instanceof ApiError ? err.message : opts.text.failed);
      if (opts.focusPasswordOnError) password.current?.focus();
    }
  };

  return { password, issues, message, status, pending: status !== "idle", submitWith };
}
