// Buttons and button-looking links: at least 44 px tall, one look per job.
import Link from "next/link";
import type { ComponentProps } from "react";

export type ButtonVariant = "primary" | "secondary" | "quiet";

const VARIANTS: Record<ButtonVariant, string> = {
  primary: "bg-turf text-white hover:bg-turf-dark border border-turf-dark",
  secondary: "bg-paper-raised text-ink border border-ink-soft/40 hover:border-ink hover:bg-paper-sunk",
  quiet: "bg-transparent text-ink hover:bg-paper-sunk border border-transparent",
};

export function buttonClass(variant: ButtonVariant = "primary", extra = ""): string {
  return [
    "inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 text-base font-semibold",
    "transition-colors disabled:cursor-not-allowed disabled:opacity-60",
    VARIANTS[variant],
    extra,
  ].join(" ");
}

export function Button({ variant = "primary", className = "", type = "button", ...props }: ComponentProps<"button"> & { variant?: ButtonVariant }) {
  return <button type={type} className={buttonClass(variant, className)} {...props} />;
}

export function ButtonLink({ variant = "secondary", className = "", ...props }: ComponentProps<typeof Link> & { variant?: ButtonVariant }) {
  return <Link className={buttonClass(variant, className)} {...props} />;
}
