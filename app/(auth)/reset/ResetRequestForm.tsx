"use client";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";

export function ResetRequestForm() {
  const [state, setState] = useState<{ busy: boolean; done?: string; error?: ApiError }>({ busy: false });
  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const email = new FormData(e.currentTarget).get("email");
    setState({ busy: true });
    try {
      const res = await sendJson<{ message: string }>("/api/auth/password-reset", "POST", { email });
      setState({ busy: false, done: res!.message });
    } catch (err) {
      setState({ busy: false, error: err as ApiError });
    }
  }
  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <TextField id="email" name="email" type="email" label="E-mail" autoComplete="email" required errors={state.error?.issues.email ?? []} />
      <FormMessage id="reset-status" tone={state.error ? "bad" : "info"}>
        {state.done ?? (state.error && !state.error.issues.email ? state.error.message : "")}
      </FormMessage>
      <Button type="submit" disabled={state.busy} className="w-full">
        E-mail me a link
      </Button>
    </form>
  );
}
