// A labelled input with its hint and field errors wired for screen readers.
import type { ComponentProps } from "react";

type Props = Omit<ComponentProps<"input">, "id"> & { id: string; label: string; hint?: string; errors?: string[] };

export function TextField({ id, label, hint, errors = [], className = "", ...input }: Props) {
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = errors.length ? `${id}-error` : undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="block font-semibold text-ink">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      <input
        id={id}
        aria-invalid={errors.length > 0 || undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(" ") || undefined}
        className={`mt-1 block min-h-12 w-full rounded-lg border bg-paper-raised px-3 text-lg text-ink placeholder:text-ink-faint ${
          errors.length ? "border-signal-bad ring-1 ring-signal-bad" : "border-ink/30"
        }`}
        {...input}
      />
      {errors.length ? (
        <ul id={errorId} className="mt-1 text-sm font-medium text-signal-bad">
          {errors.map((e) => (
            <li key={e}>{e}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
