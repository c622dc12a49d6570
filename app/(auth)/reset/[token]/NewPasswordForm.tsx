"use client";
import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";
import { useApi } from "@/components/use-api";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";

export function NewPasswordForm({ token }: { token: string }) {
  const check = useApi<{ ok: true }>(`/api/auth/password-reset/confirm?token=${encodeURIComponent(token)}`);
  const [state, setState] = useState<{ busy: boolean; done?: string; error?: ApiError }>({ busy: false });
  if (check.error) return <p role="alert" className="text-lg font-semibold text-signal-bad">{check.error.message}</p>;
  if (state.done) {
    return (
      <div className="space-y-4">
        <p role="status" className="text-lg">{state.done}</p>
        <Link href="/sign-in" className="font-semibold text-turf-dark underline underline-offset-4">Sign in</Link>
      </div>
    );
  }
  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const password = new FormData(e.currentTarget).get("password");
    setState({ busy: true });
    try {
      const res = await sendJson<{ message: string }>("/api/auth/password-reset/confirm", "POST", { token, password });
      setState({ busy: false, done: res!.message });
    } catch (err) {
      setState({ busy: false, error: err as ApiError });
    }
  }
  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <TextField id="password" name="password" type="password" label="New password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`} autoComplete="new-password" required errors={state.error?.issues.password ?? []} />
      <FormMessage id="new-password-status" tone={state.error ? "bad" : "info"}>
        {state.error && !state.error.issues.password ? state.error.message : state.busy ? "Saving…" : ""}
      </FormMessage>
      <Button type="submit" disabled={state.busy || !check.data} className="w-full">
        Set the new password
      </Button>
    </form>
  );
}
