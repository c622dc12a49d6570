// The role model in one table: what each role of a program may do. Pure, used by lib/auth/access.ts and the UI.
export type Role = "director" | "designer" | "staff";
export const ROLES: readonly Role[] = ["director", "designer", "staff"];

export type Action =
  | "read" // every screen of the program
  | "comment" // notes and box readings
  | "edit-drill" // roster, sets, positions, imports
  | "edit-music" // phrases, voices, written dynamics
  | "adopt-plan" // adopt a balance plan or a calibration
  | "manage-show" // create and import shows; settings, conditions and listening points
  | "retire-show" // duplicate, archive, delete and restore shows
  | "manage-members"; // invitations, roles, removals

const GRANTS: Record<Role, readonly Action[]> = {
  director: ["read", "comment", "edit-drill", "edit-music", "adopt-plan", "manage-show", "retire-show", "manage-members"],
  designer: ["read", "comment", "edit-drill", "edit-music", "manage-show"],
  staff: ["read", "comment"],
};

export function can(role: Role, action: Action): boolean {
  return GRANTS[role].includes(action);
}
