// @ts-nocheck
import { sql } from "drizzle-orm";
import {
  bigserial,
  boolean,
  doublePrecision,
  index,
  integer,
  jsonb,
  numeric,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

// Quantities are stored in SI (m, m³, Pa, K) like calc/; money as numeric(12,2), read as
// strings and summed with decimal.js.

export const roleEnum = pgEnum("role", ["member", "tuner", "sales", "instructor", "admin"]);
export const unitSystemEnum = pgEnum("unit_system", ["imperial", "metric"]);
export const tokenKindEnum = pgEnum("token_kind", ["magic-link", "password-reset"]);
export const blowerKindEnum = pgEnum("blower_kind", ["roots", "twin-screw"]);
export const pulleyPositionEnum = pgEnum("pulley_position", ["crank", "blower"]);
export const recommendationStatusEnum = pgEnum("recommendation_status", [
  "draft",
  "sent",
  "accepted",
  "declined",
]);

export const depositKindEnum = pgEnum("deposit_kind", ["percent", "fixed"]);
export const orderStatusEnum = pgEnum("order_status", [
  "awaiting-payment",
  "paid",
  "parts-reserved",
  "back-ordered",
  "fitted",
  "cancelled",
  "refunded",
]);

const created = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
const updated = () => timestamp("updated_at", { withTimezone: true }).notNull().defaultNow();

export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  email: text("email").notNull().unique(),
  name: text("name").notNull().default(""),
  passwordHash: text("password_hash"),
  role: roleEnum("role").notNull().default("member"),
  /** The units preset; `unitChoices` overrides it per quantity kind (see calc's resolveUnits). */
  unitSystem: unitSystemEnum("unit_system").notNull().default("imperial"),
  /** Unit id per quantity kind where the person departs from the preset, e.g. { "displacement": "L" }. */
  unitChoices: jsonb("unit_choices").$type<Record<string, string>>().notNull().default({}),
  disabled: boolean("disabled").notNull().default(false),
  emailVerifiedAt: timestamp("email_verified_at", { withTimezone: true }),
  /** Carried in every session cookie; bumping it ends every session of the account at once. */
  sessionVersion: integer("session_version").notNull().default(0),
  createdAt: created(),
});

/** One-time tokens for e-mailed sign-in links and password resets; only a hash is kept. */
export const authTokens = pgTable("auth_tokens", {
  id: uuid("id").primaryKey().defaultRandom(),
  userId: uuid("user_id")
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  kind: tokenKindEnum("kind").notNull(),
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  usedAt: timestamp("used_at", { withTimezone: true }),
  createdAt: created(),
});

/** Sign-in attempts, for rate limiting per account and per address. */
export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    email: text("email").notNull(),
    ip: text("ip").notNull(),
    success: boolean("success").notNull(),
    createdAt: created(),
  },
  (t) => [index("sign_in_attempts_email_idx").on(t.email, t.createdAt), index("sign_in_attempts_ip_idx").on(t.ip, t.createdAt)],
);

/**
 * Requests counted against a limit (mail per recipient, sign-ups per address, …). A row is
 * reserved under an advisory lock before the work is done, so parallel requests cannot all pass.
 */
export const rateLimitHits = pgTable(
  "rate_limit_hits",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    bucket: text("bucket").notNull(),
    createdAt: created(),
  },
  (t) => [index("rate_limit_hits_bucket_idx").on(t.bucket, t.createdAt)],
);

export const mailStatusEnum = pgEnum("mail_status", ["queued", "sending", "sent", "failed"]);

/** Mail waiting to be sent, being sent, sent or given up on; the app's sender works through it. */
export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    textBody: text("text_body").notNull(),
    htmlBody: text("html_body"),
    /** Attachments as JSON ({ filename, contentType, base64 }[]); small (one PDF at most). */
    attachments: jsonb("attachments"),
    /** What to mark when the mail finally goes or fails, e.g. "recommendation:<id>". */
    purpose: text("purpose"),
    status: mailStatusEnum("status").notNull().default("queued"),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }).notNull().defaultNow(),
    lockedUntil: timestamp("locked_until", { withTimezone: true }),
    lastError: text("last_error"),
    sentAt: timestamp("sent_at", { withTimezone: true }),
    createdAt: created(),
  },
  (t) => [index("mail_outbox_due_idx").on(t.status, t.nextAttemptAt)],
);

/** A saved engine + blower + drive combination. `spec` is a calc Combination (validated by calc's schema). */
export const combinations = pgTable(
  "combinations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: uuid("owner_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    customerName: text("customer_name"),
    customerContact: text("customer_contact"),
    spec: jsonb("spec").notNull(),
    // Denormalised from spec for listing, searching and sorting.
    displacement: doublePrecision("displacement").notNull(),
    blowerKind: blowerKindEnum("blower_kind").notNull(),
    blowerPulleyDiameter: doublePrecision("blower_pulley_diameter").notNull(),
    revision: integer("revision").notNull().default(1),
    isDemo: boolean("is_demo").notNull().default(false),
    deletedAt: timestamp("deleted_at", { withTimezone: true }),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [
    index("combinations_owner_idx").on(t.ownerId, t.updatedAt),
    index("combinations_name_idx").on(t.name),
    index("combinations_updated_idx").on(t.updatedAt),
  ],
);

export const combinationRevisions = pgTable(
  "combination_revisions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    combinationId: uuid("combination_id")
      .notNull()
      .references(() => combinations.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    name: text("name").notNull(),
    spec: jsonb("spec").notNull(),
    note: text("note"),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: created(),
  },
  (t) => [uniqueIndex("combination_revisions_number_idx").on(t.combinationId, t.number)],
);

export const blowers = pgTable("blowers", {
  id: uuid("id").primaryKey().defaultRandom(),
  partNumber: text("part_number").notNull().unique(),
  name: text("name").notNull(),
  kind: blowerKindEnum("kind").notNull(),
  displacementPerRev: doublePrecision("displacement_per_rev").notNull(),
  builtInVolumeRatio: doublePrecision("built_in_volume_ratio").notNull(),
  maxRpm: doublePrecision("max_rpm").notNull(),
  volumetricEfficiencyRef: doublePrecision("volumetric_efficiency_ref").notNull(),
  referenceRpm: doublePrecision("reference_rpm").notNull(),
  internalEfficiency: doublePrecision("internal_efficiency").notNull(),
  mechanicalEfficiency: doublePrecision("mechanical_efficiency").notNull(),
  notes: text("notes").notNull().default(""),
  price: numeric("price", { precision: 12, scale: 2 }).notNull(),
  stock: integer("stock").notNull().default(0),
  createdAt: created(),
  updatedAt: updated(),
});

export const pulleys = pgTable(
  "pulleys",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    partNumber: text("part_number").notNull().unique(),
    position: pulleyPositionEnum("position").notNull(),
    diameter: doublePrecision("diameter").notNull(),
    ribCount: integer("rib_count").notNull(),
    minBeltDiameter: doublePrecision("min_belt_diameter"),
    price: numeric("price", { precision: 12, scale: 2 }).notNull(),
    stock: integer("stock").notNull().default(0),
    notes: text("notes").notNull().default(""),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [index("pulleys_position_idx").on(t.position, t.diameter)],
);

/** A measured log, tied to the combination revision it was logged with. The raw file is kept. */
export const datalogs = pgTable(
  "datalogs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: uuid("owner_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    combinationId: uuid("combination_id")
      .notNull()
      .references(() => combinations.id, { onDelete: "cascade" }),
    revision: integer("revision").notNull(),
    name: text("name").notNull(),
    fileName: text("file_name").notNull(),
    rawText: text("raw_text").notNull(),
    mapping: jsonb("mapping").notNull(),
    ambient: jsonb("ambient"),
    pointCount: integer("point_count").notNull(),
    createdAt: created(),
  },
  (t) => [index("datalogs_owner_idx").on(t.ownerId, t.createdAt), index("datalogs_combination_idx").on(t.combinationId)],
);

export const datalogPoints = pgTable(
  "datalog_points",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    datalogId: uuid("datalog_id")
      .notNull()
      .references(() => datalogs.id, { onDelete: "cascade" }),
    seq: integer("seq").notNull(),
    line: integer("line").notNull(),
    time: doublePrecision("time"),
    rpm: doublePrecision("rpm").notNull(),
    manifoldPressure: doublePrecision("manifold_pressure").notNull(),
    intakeTemperature: doublePrecision("intake_temperature"),
    throttle: doublePrecision("throttle"),
  },
  (t) => [index("datalog_points_log_idx").on(t.datalogId, t.seq)],
);

export const recommendations = pgTable(
  "recommendations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    combinationId: uuid("combination_id")
      .notNull()
      .references(() => combinations.id, { onDelete: "cascade" }),
    revision: integer("revision").notNull(),
    authorId: uuid("author_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    /** The customer-facing title; the combination's internal name never reaches the customer. */
    title: text("title").notNull().default(""),
    customerName: text("customer_name").notNull(),
    customerEmail: text("customer_email"),
    /** The engine speed (rpm) the boost was sold at; the headline figures are read there. */
    targetRpm: doublePrecision("target_rpm"),
    vehicleNotes: text("vehicle_notes").notNull().default(""),
    notes: text("notes").notNull().default(""),
    blowerPulleyDiameter: doublePrecision("blower_pulley_diameter").notNull(),
    spec: jsonb("spec").notNull(),
    parts: jsonb("parts").notNull(),
    total: numeric("total", { precision: 12, scale: 2 }).notNull(),
    status: recommendationStatusEnum("status").notNull().default("draft"),
    sentAt: timestamp("sent_at", { withTimezone: true }),
    lastError: text("last_error"),
    /** Part of every share link; bumping it revokes the links already sent. */
    shareVersion: integer("share_version").notNull().default(0),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [index("recommendations_author_idx").on(t.authorId, t.updatedAt)],
);

export const lessons = pgTable("lessons", {
  id: uuid("id").primaryKey().defaultRandom(),
  ownerId: uuid("owner_id")
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  title: text("title").notNull(),
  summary: text("summary").notNull().default(""),
  classCode: text("class_code").notNull().unique(),
  published: boolean("published").notNull().default(false),
  createdAt: created(),
  updatedAt: updated(),
});

export const lessonSteps = pgTable(
  "lesson_steps",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    lessonId: uuid("lesson_id")
      .notNull()
      .references(() => lessons.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    title: text("title").notNull(),
    note: text("note").notNull().default(""),
    items: jsonb("items").notNull(),
    series: jsonb("series").notNull().default(sql`'["boost","netPower"]'::jsonb`),
  },
  (t) => [index("lesson_steps_lesson_idx").on(t.lessonId, t.position)],
);

/** Members who joined a lesson with its class code (read-only access). */
export const lessonMembers = pgTable(
  "lesson_members",
  {
    lessonId: uuid("lesson_id")
      .notNull()
      .references(() => lessons.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    joinedAt: timestamp("joined_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("lesson_members_idx").on(t.lessonId, t.userId)],
);

/** The shop's own details, printed on recommendation sheets (a single row, id = 1). */
export const shopSettings = pgTable("shop_settings", {
  id: integer("id").primaryKey().default(1),
  name: text("name").notNull(),
  address: text("address").notNull().default(""),
  phone: text("phone").notNull().default(""),
  email: text("email").notNull().default(""),
  website: text("website").notNull().default(""),
  /** ISO 4217 code of every price the shop shows and charges. */
  currency: text("currency").notNull().default("USD"),
  /** The deposit asked when a customer accepts a sheet: a percentage of its total, or a fixed amount. */
  depositKind: depositKindEnum("deposit_kind").notNull().default("percent"),
  depositValue: numeric("deposit_value", { precision: 12, scale: 2 }).notNull().default("25"),
});

/**
 * What the customer was sent: a frozen copy of the sheet at each send. Share links name one
 * version, so later edits never change what a link shows; staff can revoke a version.
 */
export const sheetVersions = pgTable(
  "sheet_versions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    recommendationId: uuid("recommendation_id")
      .notNull()
      .references(() => recommendations.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    snapshot: jsonb("snapshot").notNull(),
    sentAt: timestamp("sent_at", { withTimezone: true }).notNull().defaultNow(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    declinedAt: timestamp("declined_at", { withTimezone: true }),
    declineReason: text("decline_reason"),
  },
  (t) => [uniqueIndex("sheet_versions_number_idx").on(t.recommendationId, t.version)],
);

/** A customer's order: one accepted sheet version, its deposit, and where it stands. */
export const orders = pgTable(
  "orders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    recommendationId: uuid("recommendation_id")
      .notNull()
      .references(() => recommendations.id, { onDelete: "cascade" }),
    sheetVersionId: uuid("sheet_version_id")
      .notNull()
      .references(() => sheetVersions.id, { onDelete: "cascade" }),
    customerName: text("customer_name").notNull(),
    customerEmail: text("customer_email"),
    currency: text("currency").notNull(),
    total: numeric("total", { precision: 12, scale: 2 }).notNull(),
    deposit: numeric("deposit", { precision: 12, scale: 2 }).notNull(),
    status: orderStatusEnum("status").notNull().default("awaiting-payment"),
    checkoutSessionId: text("checkout_session_id").unique(),
    paymentIntentId: text("payment_intent_id"),
    refundId: text("refund_id"),
    paidAt: timestamp("paid_at", { withTimezone: true }),
    fittedAt: timestamp("fitted_at", { withTimezone: true }),
    fittedDatalogId: uuid("fitted_datalog_id").references(() => datalogs.id, { onDelete: "set null" }),
    cancelledAt: timestamp("cancelled_at", { withTimezone: true }),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [
    index("orders_status_idx").on(t.status, t.updatedAt),
    // One live order per sent version: a second checkout reuses it.
    uniqueIndex("orders_version_idx").on(t.sheetVersionId),
  ],
);

/** Shelf stock held for an order, per part: what was taken off the shelf and what is back-ordered. */
export const orderReservations = pgTable(
  "order_reservations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    partNumber: text("part_number").notNull(),
    description: text("description").notNull(),
    quantity: integer("quantity").notNull(),
    reserved: integer("reserved").notNull(),
    backOrdered: integer("back_ordered").notNull(),
    releasedAt: timestamp("released_at", { withTimezone: true }),
  },
  (t) => [index("order_reservations_order_idx").on(t.orderId)],
);

/** The payment trail of an order: what happened, when, and by whom or which event. */
export const orderEvents = pgTable(
  "order_events",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    kind: text("kind").notNull(),
    message: text("message").notNull(),
    amount: numeric("amount", { precision: 12, scale: 2 }),
    reference: text("reference"),
    actorId: uuid("actor_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: created(),
  },
  (t) => [index("order_events_order_idx").on(t.orderId, t.id)],
);

/** Payment-service events already handled, so a replayed or duplicated delivery changes nothing. */
export const paymentEvents = pgTable("payment_events", {
  eventId: text("event_id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
});

export type User = typeof users.$inferSelect;
export type Role = (typeof roleEnum.enumValues)[number];
export type CombinationRow = typeof combinations.$inferSelect;
export type CombinationRevisionRow = typeof combinationRevisions.$inferSelect;
export type BlowerRow = typeof blowers.$inferSelect;
export type PulleyRow = typeof pulleys.$inferSelect;
export type DatalogRow = typeof datalogs.$inferSelect;
export type DatalogPointRow = typeof datalogPoints.$inferSelect;
export type RecommendationRow = typeof recommendations.$inferSelect;
export type LessonRow = typeof lessons.$inferSelect;
export type SheetVersionRow = typeof sheetVersions.$inferSelect;
export type OrderRow = typeof orders.$inferSelect;
export type OrderStatus = (typeof orderStatusEnum.enumValues)[number];
export type OrderReservationRow = typeof orderReservations.$inferSelect;
export type OrderEventRow = typeof orderEvents.$inferSelect;
export type LessonStepRow = typeof lessonSteps.$inferSelect;
