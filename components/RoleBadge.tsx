// A member's role in a program, as a word (the colour only repeats it).
import type { Role } from "@/lib/auth/permissions";

const STYLES: Record<Role, string> = {
  director: "bg-turf-dark text-white border-turf-dark",
  designer: "bg-turf-light text-turf-dark border-turf/40",
  staff: "bg-paper-sunk text-ink border-ink/20",
};

export const ROLE_WORDS: Record<Role, string> = { director: "Director", designer: "Designer", staff: "Staff" };

export function RoleBadge({ role }: { role: Role }) {
  return (
    <span className={`inline-flex items-center rounded-full border px-3 py-0.5 text-sm font-semibold ${STYLES[role]}`}>
      {ROLE_WORDS[role]}
    </span>
  );
}
