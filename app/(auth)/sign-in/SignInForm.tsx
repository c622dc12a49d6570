"use client";
// Posts the e-mail and password as JSON; shows field errors and the API's message; never refills the password.
import { useRouter } from "next/navigation";
import { useRef, useState, type FormEvent } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";
import { fieldIssues } from "@/lib/http/body";
import { signInSchema } from "@/lib/validation/auth";

type Issues = Record<string, string[]>;

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const password = useRef<HTMLInputElement>(null);
  const [email, setEmail] = useState("");
  const [issues, setIssues] = useState<Issues>({});
  const [message, setMessage] = useState("");
  const [status, setStatus] = useState<"idle" | "pending" | "done">("idle");

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const input = { email, password: password.current?.value ?? "" };
    const parsed = signInSchema.safeParse(input);
    if (!parsed.success) {
      setIssues(fieldIssues(parsed.error));
      setMessage("Check the highlighted fields.");
      return;
    }
    setStatus("pending");
    setIssues({});
    setMessage("Signing in…");
    try {
      await sendJson("/api/auth/sign-in", "POST", parsed.data);
      setStatus("done");
      setMessage("Signed in. Opening your programs…");
      router.replace(next);
      router.refresh();
    } catch (err) {
      if (password.current) password.current.value = "";
      setStatus("idle");
      setIssues(err instanceof ApiError ? err.issues : {});
      setMessage(err instanceof ApiError ? err.message : "Signing in failed. Try again.");
      password.current?.focus();
    }
  }

  const pending = status !== "idle";
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-describedby="sign-in-status">
      <TextField
        id="email"
        name="email"
        type="email"
        label="E-mail"
        autoComplete="username"
        inputMode="email"
        required
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        errors={issues.email}
      />
      <TextField id="password" name="password" type="password" label="Password" autoComplete="current-password" required ref={password} errors={issues.password} />
      <FormMessage id="sign-in-status" tone={status === "idle" && message ? "bad" : "info"}>
        {message}
      </FormMessage>
      <Button type="submit" disabled={pending} className="w-full">
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
