"use client";
// Asks for the account and its program; the account is created from the link mailed to the address
// (the answer is the same whether or not the address has an account). The password is never refilled.
import { useState } from "react";
import { Button } from "@/components/Button";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";
import { usePasswordForm } from "@/components/use-password-form";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";
import { signUpSchema } from "@/lib/validation/auth";

type Fields = { name: string; email: string; programName: string };

export function SignUpForm() {
  const [fields, setFields] = useState<Fields>({ name: "", email: "", programName: "" });
  const [sent, setSent] = useState<string | null>(null);
  const { password, issues, message, status, pending, submitWith } = usePasswordForm<typeof signUpSchema, { message: string }>({
    schema: signUpSchema,
    url: "/api/auth/sign-up",
    text: { pending: "Sending…", done: "Check your e-mail.", failed: "Sending failed. Try again." },
    onDone: (res) => setSent(res?.message ?? "Check your e-mail to continue."),
  });
  const set = (key: keyof Fields) => (e: { target: { value: string } }) => setFields((f) => ({ ...f, [key]: e.target.value }));
  const onSubmit = submitWith(fields);
  if (sent) {
    return (
      <div role="status" className="space-y-3">
        <p className="text-lg font-semibold text-ink">Check your e-mail</p>
        <p>{sent}</p>
        <p className="text-ink-soft">No message? Check the address and your spam folder, or sign up again in a few minutes.</p>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-describedby="sign-up-status">
      <TextField id="name" name="name" label="Your name" autoComplete="name" required value={fields.name} onChange={set("name")} errors={issues.name} />
      <TextField
        id="email"
        name="email"
        type="email"
        label="E-mail"
        autoComplete="email"
        inputMode="email"
        required
        value={fields.email}
        onChange={set("email")}
        errors={issues.email}
      />
      <TextField
        id="password"
        name="password"
        type="password"
        label="Password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        autoComplete="new-password"
        required
        minLength={MIN_PASSWORD_LENGTH}
        ref={password}
        errors={issues.password}
      />
      <TextField
        id="programName"
        name="programName"
        label="Band program"
        hint="For example: Lakeview High School Marching Band"
        autoComplete="organization"
        required
        value={fields.programName}
        onChange={set("programName")}
        errors={issues.programName}
      />
      <FormMessage id="sign-up-status" tone={status === "idle" && message ? "bad" : "info"}>
        {message}
      </FormMessage>
      <Button type="submit" disabled={pending} className="w-full">
        {pending ? "Sending…" : "Create account"}
      </Button>
    </form>
  );
}
