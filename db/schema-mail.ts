// Outgoing mail that people can make the app send (invitations, sign-up messages), counted in the
// database so every app process enforces the same limits, and sign-ups waiting for their address to
// be confirmed.
import { index, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { programs, users } from "./schema";

const at = (name: string) => timestamp(name, { withTimezone: true, mode: "date" });

export const mailKindEnum = pgEnum("mail_kind", ["invitation", "sign-up"]);

// One row per message sent on someone's request: invitations and resends carry their program and sender.
export const mailLog = pgTable(
  "mail_log",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    kind: mailKindEnum("kind").notNull(),
    programId: uuid("program_id").references(() => programs.id, { onDelete: "cascade" }),
    senderId: text("sender_id").references(() => users.id, { onDelete: "cascade" }),
    recipient: text("recipient").notNull(),
    sentAt: at("sent_at").notNull().defaultNow(),
  },
  (t) => [
    index("mail_log_program_idx").on(t.programId, t.sentAt),
    index("mail_log_sender_idx").on(t.senderId, t.sentAt),
    index("mail_log_recipient_idx").on(t.recipient, t.sentAt),
  ],
);

// A sign-up becomes an account only through the link mailed to its address, so the sign-up answer
// never tells whether an address has an account. Only the SHA-256 of the link's token is kept.
export const pendingSignUps = pgTable(
  "pending_sign_ups",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    email: text("email").notNull(),
    name: text("name").notNull(),
    passwordHash: text("password_hash").notNull(),
    programName: text("program_name").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: at("expires_at").notNull(),
    usedAt: at("used_at"),
    createdAt: at("created_at").notNull().defaultNow(),
  },
  (t) => [index("pending_sign_ups_email_idx").on(t.email)],
);
export type PendingSignUp = typeof pendingSignUps.$inferSelect;
