"use client";
// Ends the session on the server, then leaves for the sign-in page.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useSWRConfig } from "swr";
import { Button } from "./Button";
import { sendJson } from "./fetcher";

export function SignOutButton() {
  const router = useRouter();
  const { mutate } = useSWRConfig();
  const [pending, setPending] = useState(false);
  const [failed, setFailed] = useState(false);

  async function signOut() {
    setPending(true);
    setFailed(false);
    try {
      await sendJson("/api/auth/sign-out", "POST");
      // Forget every cached answer so the next user sees nothing of this one.
      await mutate(() => true, undefined, { revalidate: false });
      router.replace("/sign-in");
      router.refresh();
    } catch {
      setFailed(true);
      setPending(false);
    }
  }

  return (
    <span className="flex items-center gap-2">
      {failed ? (
        <span role="alert" className="text-sm text-signal-bad">
          Sign-out failed. Try again.
        </span>
      ) : null}
      <Button variant="secondary" onClick={signOut} disabled={pending}>
        {pending ? "Signing out…" : "Sign out"}
      </Button>
    </span>
  );
}
