import { sql } from "drizzle-orm";
import { blob, index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";

/** Roles of the brief's table; the order is only for display. */
export const ROLES = ["admin", "planner", "trainer", "council"] as const;
export type Role = (typeof ROLES)[number];

const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(unixepoch('subsec') * 1000)`);

export const users = sqliteTable("users", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  /** bcrypt hash; null until an invited person sets a password. */
  passwordHash: text("password_hash"),
  role: text("role", { enum: ROLES }).notNull(),
  active: integer("active", { mode: "boolean" }).notNull().default(true),
  /** Bumped on role change or deactivation so live sessions notice on their next request. */
  tokenVersion: integer("token_version").notNull().default(0),
  /** Demo accounts exist only in demo mode; a production start refuses to run while any remain. */
  isDemo: integer("is_demo", { mode: "boolean" }).notNull().default(false),
  createdAt: createdAt(),
});
export type User = typeof users.$inferSelect;

export const SCENARIO_STATES = ["draft", "shared", "published"] as const;
export type ScenarioState = (typeof SCENARIO_STATES)[number];

export const scenarios = sqliteTable("scenarios", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  name: text("name").notNull(),
  description: text("description").notNull().default(""),
  createdBy: integer("created_by").references(() => users.id),
  createdAt: createdAt(),
});
export type ScenarioRow = typeof scenarios.$inferSelect;

export const scenarioVersions = sqliteTable(
  "scenario_versions",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    scenarioId: integer("scenario_id")
      .notNull()
      .references(() => scenarios.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    /** The scenario file (lib/scenario), validated with its zod schema before it is written. */
    params: text("params", { mode: "json" }).notNull(),
    /** Layer versions the version was computed with: { population?: id, districts?: id, facilities?: id, siteCondition?: id }. */
    layerVersions: text("layer_versions", { mode: "json" }).notNull().default(sql`'{}'`),
    state: text("state", { enum: SCENARIO_STATES }).notNull().default("draft"),
    note: text("note").notNull().default(""),
    authorId: integer("author_id").references(() => users.id),
    createdAt: createdAt(),
    publishedAt: integer("published_at", { mode: "timestamp_ms" }),
    publishedBy: integer("published_by").references(() => users.id),
    /** Headline figures frozen at publication, so the council summary can tell when today's figures differ. */
    headline: text("headline", { mode: "json" }),
  },
  (t) => [uniqueIndex("scenario_versions_number").on(t.scenarioId, t.number)],
);
export type ScenarioVersionRow = typeof scenarioVersions.$inferSelect;

export const LAYER_KINDS = ["population", "districts", "facilities", "stations", "site-condition"] as const;
export type LayerKind = (typeof LAYER_KINDS)[number];

export const layers = sqliteTable("layers", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  kind: text("kind", { enum: LAYER_KINDS }).notNull(),
  name: text("name").notNull(),
  createdBy: integer("created_by").references(() => users.id),
  createdAt: createdAt(),
});
export type LayerRow = typeof layers.$inferSelect;

export const layerVersions = sqliteTable(
  "layer_versions",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    layerId: integer("layer_id")
      .notNull()
      .references(() => layers.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    rowCount: integer("row_count").notNull(),
    /** [west, south, east, north] in degrees. */
    bbox: text("bbox", { mode: "json" }).$type<[number, number, number, number]>(),
    /** Kind-specific figures shown in lists and previews (total population, counts by kind, …). */
    summary: text("summary", { mode: "json" }).notNull().default(sql`'{}'`),
    sourceFile: text("source_file").notNull().default(""),
    createdBy: integer("created_by").references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("layer_versions_number").on(t.layerId, t.number)],
);
export type LayerVersionRow = typeof layerVersions.$inferSelect;

/**
 * Grid layers (population, site condition) are stored as packed little-endian typed-array chunks,
 * so one read of a million cells is a handful of rows instead of a million.
 * Columns: lon/lat Float64, value Float64 (people or Vs30 m/s), district Int32 (-1 = none).
 */
export const gridChunks = sqliteTable(
  "grid_chunks",
  {
    layerVersionId: integer("layer_version_id")
      .notNull()
      .references(() => layerVersions.id, { onDelete: "cascade" }),
    chunk: integer("chunk").notNull(),
    count: integer("count").notNull(),
    lon: blob("lon", { mode: "buffer" }).notNull(),
    lat: blob("lat", { mode: "buffer" }).notNull(),
    value: blob("value", { mode: "buffer" }).notNull(),
    district: blob("district", { mode: "buffer" }),
  },
  (t) => [uniqueIndex("grid_chunks_key").on(t.layerVersionId, t.chunk)],
);

export const districts = sqliteTable(
  "districts",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    layerVersionId: integer("layer_version_id")
      .notNull()
      .references(() => layerVersions.id, { onDelete: "cascade" }),
    /** Position in the layer version; population chunks refer to districts by this index. */
    idx: integer("idx").notNull(),
    name: text("name").notNull(),
    geometry: text("geometry", { mode: "json" }).notNull(),
  },
  (t) => [index("districts_layer").on(t.layerVersionId)],
);

export const FACILITY_KINDS = ["school", "hospital", "care-home", "utility", "rail", "other"] as const;
export type FacilityKind = (typeof FACILITY_KINDS)[number];

export const facilities = sqliteTable(
  "facilities",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    layerVersionId: integer("layer_version_id")
      .notNull()
      .references(() => layerVersions.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    kind: text("kind", { enum: FACILITY_KINDS }).notNull(),
    /** GeoJSON Point, or LineString for rail segments. */
    geometry: text("geometry", { mode: "json" }).notNull(),
  },
  (t) => [index("facilities_layer").on(t.layerVersionId)],
);

export const stations = sqliteTable(
  "stations",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    layerVersionId: integer("layer_version_id")
      .notNull()
      .references(() => layerVersions.id, { onDelete: "cascade" }),
    code: text("code").notNull(),
    lon: real("lon").notNull(),
    lat: real("lat").notNull(),
    operating: integer("operating", { mode: "boolean" }).notNull().default(true),
  },
  (t) => [uniqueIndex("stations_code").on(t.layerVersionId, t.code)],
);
export type StationRow = typeof stations.$inferSelect;

/** Workspace-wide settings (reaction time, intensity scale, …) as JSON values by key. */
export const settings = sqliteTable("settings", {
  key: text("key").primaryKey(),
  value: text("value", { mode: "json" }).notNull(),
});

export const protectiveActions = sqliteTable("protective_actions", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  name: text("name").notNull(),
  secondsNeeded: real("seconds_needed").notNull(),
  /** The facility kinds the action is for (a school does not stop trains); null: every kind. */
  facilityKinds: text("facility_kinds", { mode: "json" }).$type<FacilityKind[]>(),
  position: integer("position").notNull().default(0),
});

export const auditLog = sqliteTable(
  "audit_log",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    at: createdAt(),
    actorId: integer("actor_id").references(() => users.id),
    action: text("action").notNull(),
    targetType: text("target_type").notNull(),
    targetId: text("target_id"),
    /** { before?, after? } short summaries, never whole files. */
    detail: text("detail", { mode: "json" }),
  },
  (t) => [index("audit_log_at").on(t.at)],
);

export const TOKEN_KINDS = ["invite", "reset"] as const;

/** Single-use links; only a SHA-256 of the token is stored. */
export const authTokens = sqliteTable("auth_tokens", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  kind: text("kind", { enum: TOKEN_KINDS }).notNull(),
  tokenHash: text("token_hash").notNull().unique(),
  userId: integer("user_id")
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
  usedAt: integer("used_at", { mode: "timestamp_ms" }),
  createdAt: createdAt(),
});

/** Failed sign-in counters per account and per client address, shared by every app instance. */
export const signInAttempts = sqliteTable("sign_in_attempts", {
  key: text("key").primaryKey(),
  failures: integer("failures").notNull(),
  windowStart: integer("window_start", { mode: "timestamp_ms" }).notNull(),
});

/** Every message the local SMTP server received (development, tests, demo). */
export const outbox = sqliteTable("outbox", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  receivedAt: createdAt(),
  from: text("from").notNull(),
  to: text("to").notNull(),
  subject: text("subject").notNull(),
  text: text("text").notNull(),
  raw: text("raw").notNull(),
});

export const exportLog = sqliteTable("export_log", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  at: createdAt(),
  userId: integer("user_id").references(() => users.id),
  kind: text("kind").notNull(),
  scenarioVersionId: integer("scenario_version_id").references(() => scenarioVersions.id, { onDelete: "cascade" }),
});

/** Computed exposure results, keyed by scenario version, layer versions and settings. */
export const resultCache = sqliteTable("result_cache", {
  key: text("key").primaryKey(),
  scenarioVersionId: integer("scenario_version_id")
    .notNull()
    .references(() => scenarioVersions.id, { onDelete: "cascade" }),
  result: text("result", { mode: "json" }).notNull(),
  createdAt: createdAt(),
});
