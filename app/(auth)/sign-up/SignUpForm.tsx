"use client";
// Creates the account and its program, then opens the new program. The password is never refilled.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/Button";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";
import { usePasswordForm } from "@/components/use-password-form";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";
import { signUpSchema } from "@/lib/validation/auth";

type Fields = { name: string; email: string; programName: string };

export function SignUpForm() {
  const router = useRouter();
  const [fields, setFields] = useState<Fields>({ name: "", email: "", programName: "" });
  const { password, issues, message, status, pending, submitWith } = usePasswordForm<typeof signUpSchema, { programId: string }>({
    schema: signUpSchema,
    url: "/api/auth/sign-up",
    text: { pending: "Creating your account…", done: "Account created. Opening your program…", failed: "Creating the account failed. Try again." },
    onDone: (res) => {
      router.replace(res ? `/programs/${res.programId}` : "/programs");
      router.refresh();
    },
  });
  const set = (key: keyof Fields) => (e: { target: { value: string } }) => setFields((f) => ({ ...f, [key]: e.target.value }));
  const onSubmit = submitWith(fields);
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
        {pending ? "Creating…" : "Create account"}
      </Button>
    </form>
  );
}
