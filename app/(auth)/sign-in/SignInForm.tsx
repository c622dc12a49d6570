"use client";
// Posts the e-mail and password as JSON; shows field errors and the API's message; never refills the password.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/Button";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";
import { usePasswordForm } from "@/components/use-password-form";
import { signInSchema } from "@/lib/validation/auth";

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [email, setEmail] = useState("");
  const { password, issues, message, status, pending, submitWith } = usePasswordForm({
    schema: signInSchema,
    url: "/api/auth/sign-in",
    text: { pending: "Signing in…", done: "Signed in. Opening your programs…", failed: "Signing in failed. Try again." },
    onDone: () => {
      router.replace(next);
      router.refresh();
    },
    focusPasswordOnError: true,
  });
  const onSubmit = submitWith({ email });
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
