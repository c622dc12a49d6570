// Team and paperwork: invitations, password resets and the uploaded files kept as sent.
import { customType, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { programs, roleEnum, shows, users } from "./schema";

const at = (name: string) => timestamp(name, { withTimezone: true, mode: "date" });

const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => "bytea" });

// Only the SHA-256 of an invitation's token is kept; resending issues a new token and expiry.
export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    programId: uuid("program_id")
      .notNull()
      .references(() => programs.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: roleEnum("role").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: at("expires_at").notNull(),
    usedAt: at("used_at"),
    revokedAt: at("revoked_at"),
    invitedBy: text("invited_by").references(() => users.id, { onDelete: "set null" }),
    acceptedBy: text("accepted_by").references(() => users.id, { onDelete: "set null" }),
    sentAt: at("sent_at").notNull().defaultNow(),
    createdAt: at("created_at").notNull().defaultNow(),
  },
  (t) => [index("invitations_program_idx").on(t.programId)],
);
export type Invitation = typeof invitations.$inferSelect;

export const passwordResets = pgTable(
  "password_resets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: at("expires_at").notNull(),
    usedAt: at("used_at"),
    createdAt: at("created_at").notNull().defaultNow(),
  },
  (t) => [index("password_resets_user_idx").on(t.userId, t.createdAt)],
);
export type PasswordReset = typeof passwordResets.$inferSelect;

export const uploadKindEnum = pgEnum("upload_kind", ["roster-csv", "drill-csv", "show-json", "musicxml"]);

// Every uploaded file as it arrived, with who sent it and when; confirmedAt marks the one write it led to.
export const uploads = pgTable(
  "uploads",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    programId: uuid("program_id")
      .notNull()
      .references(() => programs.id, { onDelete: "cascade" }),
    showId: uuid("show_id").references(() => shows.id, { onDelete: "cascade" }),
    kind: uploadKindEnum("kind").notNull(),
    fileName: text("file_name").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    content: bytea("content").notNull(),
    uploadedBy: text("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    uploadedAt: at("uploaded_at").notNull().defaultNow(),
    confirmedAt: at("confirmed_at"),
    /** What the confirmed write did (counts), for the upload history. */
    summary: jsonb("summary"),
  },
  (t) => [index("uploads_show_idx").on(t.showId, t.uploadedAt), index("uploads_program_idx").on(t.programId)],
);
export type Upload = typeof uploads.$inferSelect;
