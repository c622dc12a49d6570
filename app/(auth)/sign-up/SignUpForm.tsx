"use client";
// Creates the account and its program, then opens the new program. The password is never refilled.
import { useRouter } from "next/navigation";
import { useRef, useState, type FormEvent } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";
import { fieldIssues } from "@/lib/http/body";
import { signUpSchema } from "@/lib/validation/auth";

type Fields = { name: string; email: string; programName: string };

export function SignUpForm() {
  const router = useRouter();
  const password = useRef<HTMLInputElement>(null);
  const [fields, setFields] = useState<Fields>({ name: "", email: "", programName: "" });
  const [issues, setIssues] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState("");
  const [status, setStatus] = useState<"idle" | "pending" | "done">("idle");

  const set = (key: keyof Fields) => (e: { target: { value: string } }) => setFields((f) => ({ ...f, [key]: e.target.value }));

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const parsed = signUpSchema.safeParse({ ...fields, password: password.current?.value ?? "" });
    if (!parsed.success) {
      setIssues(fieldIssues(parsed.error));
      setMessage("Check the highlighted fields.");
      return;
    }
    setStatus("pending");
    setIssues({});
    setMessage("Creating your account…");
    try {
      const res = await sendJson<{ programId: string }>("/api/auth/sign-up", "POST", parsed.data);
      setStatus("done");
      setMessage("Account created. Opening your program…");
      router.replace(res ? `/programs/${res.programId}` : "/programs");
      router.refresh();
    } catch (err) {
      if (password.current) password.current.value = "";
      setStatus("idle");
      setIssues(err instanceof ApiError ? err.issues : {});
      setMessage(err instanceof ApiError ? err.message : "Creating the account failed. Try again.");
    }
  }

  const pending = status !== "idle";
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
