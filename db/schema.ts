// The whole data model. Row types are exported beside each table.
import { sql } from "drizzle-orm";
import {
  bigint,
  check,
  doublePrecision,
  index,
  integer,
  json,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

const createdAt = () => timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();
const updatedAt = () =>
  timestamp("updated_at", { withTimezone: true, mode: "date" })
    .notNull()
    .defaultNow()
    .$onUpdate(() => new Date());

export const roleEnum = pgEnum("role", ["director", "designer", "staff"]);
export const fieldRulesEnum = pgEnum("field_rules", ["high-school", "college"]);
export const voiceEnum = pgEnum("voice", ["melody", "countermelody", "accompaniment", "bass", "percussion", "tacet"]);
export const dynamicEnum = pgEnum("dynamic", ["pp", "p", "mp", "mf", "f", "ff", "fff"]);

// Users and sessions: text ids because Lucia's Drizzle adapter expects them.
export const users = pgTable("users", {
  id: text("id").primaryKey(),
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  passwordHash: text("password_hash").notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;

// The session id is the SHA-256 of the cookie's token, so a leaked table grants nothing.
export const sessions = pgTable(
  "sessions",
  {
    id: text("id").primaryKey(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
  },
  (t) => [index("sessions_user_idx").on(t.userId)],
);

// Sign-in limits: one counter row per key ("account:…", "address:…", "device:…"), reserved in one
// atomic upsert before a password is checked, so parallel attempts cannot all be tried.
export const signInLimits = pgTable("sign_in_limits", {
  key: text("key").primaryKey(),
  failures: integer("failures").notNull(),
  windowStartedAt: timestamp("window_started_at", { withTimezone: true, mode: "date" }).notNull(),
  // The next attempt is refused before this time (accounts slow down instead of locking).
  nextAllowedAt: timestamp("next_allowed_at", { withTimezone: true, mode: "date" }).notNull(),
});

// Browsers that signed in to an account before (the device cookie's token, hashed): the owner keeps
// signing in from them while an attacker slows the account down.
export const knownDevices = pgTable(
  "known_devices",
  {
    tokenHash: text("token_hash").primaryKey(),
    email: text("email").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("known_devices_created_idx").on(t.createdAt)],
);

export const programs = pgTable("programs", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});
export type Program = typeof programs.$inferSelect;

export const memberships = pgTable(
  "memberships",
  {
    programId: uuid("program_id")
      .notNull()
      .references(() => programs.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.programId, t.userId] }), index("memberships_user_idx").on(t.userId)],
);
export type Membership = typeof memberships.$inferSelect;
export type Role = (typeof roleEnum.enumValues)[number];

// The program's instrument catalog, versioned: the newest row is in force, older ones can be restored.
export const instrumentCatalogs = pgTable(
  "instrument_catalogs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    programId: uuid("program_id")
      .notNull()
      .references(() => programs.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    instruments: jsonb("instruments").notNull(),
    note: text("note").notNull().default(""),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("instrument_catalogs_program_version_idx").on(t.programId, t.version)],
);

export const shows = pgTable(
  "shows",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    programId: uuid("program_id")
      .notNull()
      .references(() => programs.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    fieldRules: fieldRulesEnum("field_rules").notNull().default("high-school"),
    temperatureC: doublePrecision("temperature_c").notNull().default(20),
    relativeHumidityPct: doublePrecision("relative_humidity_pct").notNull().default(50),
    pressureKPa: doublePrecision("pressure_kpa").notNull().default(101.325),
    /** ISO 9613-2 G of the field surface the performers stand on (null: no ground term). */
    groundFactor: doublePrecision("ground_factor"),
    /** G of the ground between the field and the listening points (track, aprons); null: the field's. */
    betweenGroundFactor: doublePrecision("between_ground_factor"),
    /** The director's thresholds for the balance checks; null keeps the defaults. */
    checkTargets: jsonb("check_targets"),
    /** The director's musical limits for the balance plan (lib/acoustics/plan-limits.ts); null keeps the defaults. */
    planLimits: jsonb("plan_limits"),
    /** Moved by database triggers on every write to a show-wide input of the analyses (migration 0005). */
    inputsRevision: bigint("inputs_revision", { mode: "number" }).notNull().default(0),
    /** Set aside by a director: still readable, listed apart from the season's shows. */
    archivedAt: timestamp("archived_at", { withTimezone: true, mode: "date" }),
    /** Deleted by a director: hidden everywhere, restorable until it is purged (lib/show-lifecycle.ts). */
    deletedAt: timestamp("deleted_at", { withTimezone: true, mode: "date" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("shows_program_idx").on(t.programId),
    // The engine's range (lib/acoustics/atmosphere.ts validateAir); NaN sorts above every number in
    // PostgreSQL, so these ranges refuse NaN and ±Infinity too (migration 0007).
    check(
      "shows_conditions_in_range",
      sql`${t.temperatureC} between -50 and 60 and ${t.relativeHumidityPct} between 0 and 100 and ${t.pressureKPa} > 0 and ${t.pressureKPa} <= 200 and ${t.groundFactor} between 0 and 1`,
    ),
    check("shows_between_ground_factor_range", sql`${t.betweenGroundFactor} between 0 and 1`),
  ],
);
export type Show = typeof shows.$inferSelect;

export const listeningPoints = pgTable(
  "listening_points",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    showId: uuid("show_id")
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    x: doublePrecision("x").notNull(),
    y: doublePrecision("y").notNull(),
    z: doublePrecision("z").notNull(),
    order: integer("order").notNull().default(0),
    /** G of the ground around the point, e.g. 0 for concrete stands; null: the ground between. */
    groundFactor: doublePrecision("ground_factor"),
    /** How far (m) that ground reaches from the point toward the field. */
    surroundingsM: doublePrecision("surroundings_m").notNull().default(0),
    /** What the point hears besides the band (lib/acoustics/background.ts Background); null: nothing. */
    background: jsonb("background"),
  },
  (t) => [
    index("listening_points_show_idx").on(t.showId),
    // Generous: a listening point within a kilometre of the 50, at most 100 m below or 1 km above the field.
    check("listening_points_in_range", sql`${t.x} between -1000 and 1000 and ${t.y} between -1000 and 1000 and ${t.z} between -100 and 1000`),
    check("listening_points_ground_factor_range", sql`${t.groundFactor} between 0 and 1`),
    check("listening_points_surroundings_range", sql`${t.surroundingsM} between 0 and 1000`),
  ],
);
export type ListeningPoint = typeof listeningPoints.$inferSelect;

export const performers = pgTable(
  "performers",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    showId: uuid("show_id")
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    label: text("label").notNull(),
    instrument: text("instrument").notNull(),
    section: text("section").notNull(),
    part: text("part").notNull().default(""),
    strengthDb: doublePrecision("strength_db").notNull().default(0),
    name: text("name"),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("performers_show_label_idx").on(t.showId, t.label),
    check("performers_strength_in_range", sql`${t.strengthDb} between -6 and 6`),
  ],
);
export type Performer = typeof performers.$inferSelect;

export const movements = pgTable(
  "movements",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    showId: uuid("show_id")
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    name: text("name").notNull(),
  },
  (t) => [uniqueIndex("movements_show_number_idx").on(t.showId, t.number)],
);

export const sets = pgTable(
  "sets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    showId: uuid("show_id")
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    movementId: uuid("movement_id").references(() => movements.id, { onDelete: "set null" }),
    /** As the drill names it: "12" or "12A". */
    number: text("number").notNull(),
    /** Counts from the previous set to this one. */
    counts: integer("counts").notNull(),
    order: integer("order").notNull(),
    /** Optimistic concurrency: every write of the set or its positions bumps it. */
    version: integer("version").notNull().default(1),
    /** Moved by a database trigger on every write to the set's positions (migration 0005). */
    inputsRevision: bigint("inputs_revision", { mode: "number" }).notNull().default(0),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("sets_show_number_idx").on(t.showId, t.number), index("sets_show_order_idx").on(t.showId, t.order)],
);
export type DrillSet = typeof sets.$inferSelect;

export const positions = pgTable(
  "positions",
  {
    setId: uuid("set_id")
      .notNull()
      .references(() => sets.id, { onDelete: "cascade" }),
    performerId: uuid("performer_id")
      .notNull()
      .references(() => performers.id, { onDelete: "cascade" }),
    x: doublePrecision("x").notNull(),
    y: doublePrecision("y").notNull(),
    facingDeg: doublePrecision("facing_deg").notNull().default(0),
  },
  (t) => [
    primaryKey({ columns: [t.setId, t.performerId] }),
    index("positions_performer_idx").on(t.performerId),
    // A little wider than the field area lib/validation/positions.ts allows (64.864 m either side of
    // the 50, 10 m beyond each sideline), so every position the API takes fits; facing as it normalises it.
    check("positions_in_field_area", sql`${t.x} between -65 and 65 and ${t.y} between -11 and 60 and ${t.facingDeg} >= 0 and ${t.facingDeg} < 360`),
  ],
);
export type PositionRow = typeof positions.$inferSelect;

// A phrase spans the sets from firstSet to lastSet, inclusive, in set order.
export const phrases = pgTable(
  "phrases",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    showId: uuid("show_id")
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    order: integer("order").notNull(),
    firstSetId: uuid("first_set_id")
      .notNull()
      .references(() => sets.id, { onDelete: "cascade" }),
    lastSetId: uuid("last_set_id")
      .notNull()
      .references(() => sets.id, { onDelete: "cascade" }),
    /** Musical limits of this phrase laid over the show's; null keeps the show's. */
    planLimits: jsonb("plan_limits"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("phrases_show_idx").on(t.showId)],
);
export type Phrase = typeof phrases.$inferSelect;

// Per phrase, each section's voice and written dynamic; playedDynamic is an adopted plan (never overwrites the written one).
export const voiceAssignments = pgTable(
  "voice_assignments",
  {
    phraseId: uuid("phrase_id")
      .notNull()
      .references(() => phrases.id, { onDelete: "cascade" }),
    section: text("section").notNull(),
    voice: voiceEnum("voice").notNull(),
    writtenDynamic: dynamicEnum("written_dynamic").notNull(),
    playedDynamic: dynamicEnum("played_dynamic"),
    updatedAt: updatedAt(),
  },
  (t) => [primaryKey({ columns: [t.phraseId, t.section] })],
);
export type VoiceAssignment = typeof voiceAssignments.$inferSelect;

// A solo or a player laying out within a phrase.
export const performerOverrides = pgTable(
  "performer_overrides",
  {
    phraseId: uuid("phrase_id")
      .notNull()
      .references(() => phrases.id, { onDelete: "cascade" }),
    performerId: uuid("performer_id")
      .notNull()
      .references(() => performers.id, { onDelete: "cascade" }),
    voice: voiceEnum("voice").notNull(),
    writtenDynamic: dynamicEnum("written_dynamic").notNull(),
    playedDynamic: dynamicEnum("played_dynamic"),
    note: text("note").notNull().default(""),
  },
  (t) => [primaryKey({ columns: [t.phraseId, t.performerId] })],
);
export type PerformerOverride = typeof performerOverrides.$inferSelect;

// A computed result per set and listening point, reused while the hash of its inputs and the model version are unchanged.
// json, not jsonb: the result is only ever stored and read back whole, and json gives it back as the text it was sent as.
const storedResultColumns = () => ({
  setId: uuid("set_id")
    .notNull()
    .references(() => sets.id, { onDelete: "cascade" }),
  listeningPointId: uuid("listening_point_id")
    .notNull()
    .references(() => listeningPoints.id, { onDelete: "cascade" }),
  inputsHash: text("inputs_hash").notNull(),
  modelVersion: text("model_version").notNull(),
  result: json("result").notNull(),
  computedAt: timestamp("computed_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
});

// Stored box mixes, with their balance checks and plan. The two revisions are the show's and the set's
// when the result was last known to match its inputs: equal revisions mean a read needs no hash at all.
export const analyses = pgTable(
  "analyses",
  {
    ...storedResultColumns(),
    showRevision: bigint("show_revision", { mode: "number" }),
    setRevision: bigint("set_revision", { mode: "number" }),
  },
  (t) => [primaryKey({ columns: [t.setId, t.listeningPointId] })],
);
export type Analysis = typeof analyses.$inferSelect;

// Stored transition sweeps: the box levels and failing checks at every count into a set, reused
// while the hash of their inputs (both sets' positions, the voicing, conditions, catalog, targets) is unchanged.
export const balanceSweeps = pgTable(
  "balance_sweeps",
  storedResultColumns(),
  (t) => [primaryKey({ columns: [t.setId, t.listeningPointId] })],
);
export type BalanceSweep = typeof balanceSweeps.$inferSelect;
