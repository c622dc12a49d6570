"use client";
// Shows what the link creates and creates it on one press, then opens the new program.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { useApi } from "@/components/use-api";

type Pending = { signUp: { email: string; name: string; programName: string } };

export function ConfirmSignUp({ token }: { token: string }) {
  const router = useRouter();
  const info = useApi<Pending>(`/api/auth/sign-up/confirm?token=${encodeURIComponent(token)}`);
  const [state, setState] = useState<{ busy: boolean; error?: ApiError }>({ busy: false });
  if (info.error) return <p role="alert" className="text-lg font-semibold text-signal-bad">{info.error.message}</p>;
  if (!info.data) return <p role="status">Reading the link…</p>;
  const { email, name, programName } = info.data.signUp;

  async function create() {
    setState({ busy: true });
    try {
      const res = await sendJson<{ programId: string }>("/api/auth/sign-up/confirm", "POST", { token });
      router.replace(`/programs/${res!.programId}`);
      router.refresh();
    } catch (err) {
      setState({ busy: false, error: err instanceof ApiError ? err : new ApiError(0, "Something went wrong.") });
    }
  }

  return (
    <div className="space-y-4">
      <div className="rounded-lg bg-paper-sunk p-4">
        <p className="text-lg font-semibold text-ink">{programName}</p>
        <p className="mt-1 text-ink-soft">
          {name} · {email}
        </p>
      </div>
      <FormMessage id="confirm-status" tone={state.error ? "bad" : "info"}>
        {state.error ? state.error.message : state.busy ? "Creating your account…" : ""}
      </FormMessage>
      <Button type="button" onClick={create} disabled={state.busy} className="w-full">
        Create my account
      </Button>
    </div>
  );
}
