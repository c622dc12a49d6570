"use client";
// Starts a new, empty show and opens its first set in the field editor.
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";

export function NewShowForm({ programId, onCreated }: { programId: string; onCreated: () => void }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [fieldRules, setFieldRules] = useState<"high-school" | "college">("high-school");
  const [error, setError] = useState<{ message: string; issues: Record<string, string[]> } | null>(null);
  const [pending, setPending] = useState(false);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setPending(true);
    setError(null);
    try {
      const res = await sendJson<{ show: { id: string; firstSetId: string } }>(`/api/programs/${encodeURIComponent(programId)}/shows`, "POST", { name, fieldRules });
      onCreated();
      router.push(`/shows/${res!.show.id}/sets/${res!.show.firstSetId}`);
    } catch (err) {
      setPending(false);
      setError(err instanceof ApiError ? { message: err.message, issues: err.issues } : { message: "Could not create the show.", issues: {} });
    }
  }

  return (
    <form onSubmit={submit} noValidate className="mt-5 space-y-4 border-t border-ink/10 pt-5" aria-describedby="new-show-status">
      <h3 className="text-lg font-semibold text-ink">Start a new show</h3>
      <TextField id="new-show-name" label="Show name" value={name} onChange={(e) => setName(e.target.value)} errors={error?.issues.name} />
      <fieldset>
        <legend className="font-semibold text-ink">Field rules (where the hashes are)</legend>
        <div className="mt-1 flex flex-wrap gap-4">
          {(["high-school", "college"] as const).map((r) => (
            <label key={r} className="flex min-h-11 items-center gap-2">
              <input type="radio" name="field-rules" value={r} checked={fieldRules === r} onChange={() => setFieldRules(r)} />
              {r === "high-school" ? "High school" : "College"}
            </label>
          ))}
        </div>
      </fieldset>
      <div id="new-show-status" aria-live="polite">
        {error ? <FormMessage id="new-show-message" tone="bad">{error.message}</FormMessage> : null}
      </div>
      <Button type="submit" disabled={pending}>{pending ? "Creating…" : "Create the show"}</Button>
    </form>
  );
}
