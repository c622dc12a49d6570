"use client";
// Accepting an invitation: a new person picks a name and password; someone with an account types its
// password. The page is not told which applies: the person says, and the answer corrects a wrong pick.
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { RoleBadge } from "@/components/RoleBadge";
import { TextField } from "@/components/TextField";
import { useApi } from "@/components/use-api";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";

type Invitation = {
  invitation: { email: string; role: "director" | "designer" | "staff"; programName: string; invitedBy: string | null; expiresAt: string };
  signedInAs: string | null;
};

export function AcceptInvitation({ token }: { token: string }) {
  const router = useRouter();
  const info = useApi<Invitation>(`/api/invitations/${encodeURIComponent(token)}`);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const [hasAccount, setHasAccount] = useState(false);

  if (info.error) {
    return (
      <div role="alert" className="space-y-3">
        <p className="text-lg font-semibold text-signal-bad">{info.error.message}</p>
      </div>
    );
  }
  if (!info.data) return <p role="status">Reading the invitation…</p>;
  const { invitation, signedInAs } = info.data;
  const signedInAsInvited = signedInAs === invitation.email;

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setBusy(true);
    setError(null);
    try {
      const body = signedInAsInvited ? {} : hasAccount ? { password: form.get("password") } : { name: form.get("name"), password: form.get("password") };
      const res = await sendJson<{ programId: string }>(`/api/invitations/${encodeURIComponent(token)}/accept`, "POST", body);
      router.push(`/programs/${res!.programId}`);
    } catch (err) {
      const apiError = err instanceof ApiError ? err : new ApiError(0, "Something went wrong.");
      // The answer says which form applies: 401 asks for an existing account's password, a missing name for a new account.
      if (apiError.status === 401 && !hasAccount) setHasAccount(true);
      if (apiError.status === 400 && apiError.issues.name && hasAccount) setHasAccount(false);
      setError(apiError);
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <div className="rounded-lg bg-paper-sunk p-4">
        <p className="text-lg font-semibold text-ink">{invitation.programName}</p>
        <p className="mt-1 flex flex-wrap items-center gap-2 text-ink-soft">
          {invitation.invitedBy ? `${invitation.invitedBy} invited ${invitation.email} as` : `${invitation.email} is invited as`} <RoleBadge role={invitation.role} />
        </p>
      </div>
      {signedInAsInvited ? (
        <p>You are signed in as {invitation.email}.</p>
      ) : (
        <>
          <fieldset className="flex flex-wrap gap-4">
            <legend className="sr-only">Do you have a Farfield account?</legend>
            <label className="inline-flex min-h-11 items-center gap-2">
              <input type="radio" name="has-account" checked={!hasAccount} onChange={() => setHasAccount(false)} /> I am new to Farfield
            </label>
            <label className="inline-flex min-h-11 items-center gap-2">
              <input type="radio" name="has-account" checked={hasAccount} onChange={() => setHasAccount(true)} /> I have an account
            </label>
          </fieldset>
          {hasAccount ? (
            <TextField id="password" name="password" type="password" label="Password" hint={`The password of your account ${invitation.email}.`} autoComplete="current-password" required errors={error?.status === 401 ? [error.message] : []} />
          ) : (
            <>
              <TextField id="name" name="name" label="Your name" autoComplete="name" required errors={error?.issues.name ?? []} />
              <TextField id="password" name="password" type="password" label="Choose a password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`} autoComplete="new-password" required errors={error?.issues["(body)"] ?? []} />
            </>
          )}
        </>
      )}
      <FormMessage id="accept-status" tone={error ? "bad" : "info"}>
        {error && error.status !== 401 ? error.message : busy ? "Joining…" : ""}
      </FormMessage>
      <Button type="submit" disabled={busy} className="w-full">
        {signedInAsInvited || hasAccount ? "Join the program" : "Create my account and join"}
      </Button>
    </form>
  );
}
