import { sql } from "drizzle-orm";
import { foreignKey, index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { LAYOUT_STATUSES, ROLES } from "~/lib/roles";

/** Shared column helpers: a text UUID primary key and millisecond timestamps. */
const id = () =>
  text("id")
    .primaryKey()
    .$defaultFn(() => crypto.randomUUID());
const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(unixepoch() * 1000)`);
const updatedAt = () =>
  integer("updated_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(unixepoch() * 1000)`)
    .$onUpdateFn(() => new Date());

export const users = sqliteTable("users", {
  id: id(),
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  passwordHash: text("password_hash").notNull(),
  /** Raised when the password is reset: sessions signed with an older value are signed out. */
  sessionVersion: integer("session_version").notNull().default(0),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const clubs = sqliteTable("clubs", {
  id: id(),
  name: text("name").notNull(),
  /** Track guidance set used by the rule checks: "club" or "national". */
  guidanceSet: text("guidance_set").notNull().default("club"),
  /** JSON object of per-club overrides of guidance values, by rule id. */
  guidanceOverrides: text("guidance_overrides").notNull().default("{}"),
  /** JSON list of the car class ids a new layout of the club is analysed for; null: the default class. */
  defaultCarClasses: text("default_car_classes"),
  /** Farthest a marshal point may stand from the nearest track edge, m (decision 0710). */
  marshalReach: real("marshal_reach").notNull().default(3),
  /** The club's largest heat: how many marshal points a suggested plan has (decision 0710). */
  heatSize: integer("heat_size").notNull().default(10),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const memberships = sqliteTable(
  "memberships",
  {
    id: id(),
    clubId: text("club_id")
      .notNull()
      .references(() => clubs.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: text("role", { enum: ROLES }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("memberships_club_user").on(t.clubId, t.userId)],
);

export const invitations = sqliteTable(
  "invitations",
  {
    id: id(),
    clubId: text("club_id")
      .notNull()
      .references(() => clubs.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: text("role", { enum: ROLES }).notNull(),
    /** SHA-256 of the token sent by e-mail; the token itself is never stored. */
    tokenHash: text("token_hash").notNull().unique(),
    invitedBy: text("invited_by").references(() => users.id, { onDelete: "set null" }),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    acceptedAt: integer("accepted_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [index("invitations_club").on(t.clubId)],
);

export const passwordResets = sqliteTable("password_resets", {
  id: id(),
  userId: text("user_id")
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
  usedAt: integer("used_at", { mode: "timestamp_ms" }),
  createdAt: createdAt(),
});

/**
 * Signed-in browsers (server-side sessions): the cookie carries only the signed id, so deleting
 * the row (signing out) ends the session for every copy of the cookie. `data` is the session's
 * JSON (user id, session version, flash notice). See docs/decisions/0314-server-side-sessions.md.
 */
export const sessions = sqliteTable(
  "sessions",
  {
    id: text("id").primaryKey(),
    userId: text("user_id").references(() => users.id, { onDelete: "cascade" }),
    data: text("data").notNull(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
  },
  (t) => [index("sessions_user").on(t.userId), index("sessions_expires").on(t.expiresAt)],
);

/** Failed sign-ins, kept for the throttle window (by e-mail address and by client address). */
export const signInFailures = sqliteTable(
  "sign_in_failures",
  {
    id: id(),
    email: text("email").notNull(),
    clientAddress: text("client_address"),
    createdAt: createdAt(),
  },
  (t) => [
    index("sign_in_failures_email").on(t.email, t.createdAt),
    index("sign_in_failures_address").on(t.clientAddress, t.createdAt),
  ],
);

export const layouts = sqliteTable(
  "layouts",
  {
    id: id(),
    clubId: text("club_id")
      .notNull()
      .references(() => clubs.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    surface: text("surface").notNull().default("dirt"),
    trackWidth: real("track_width").notNull().default(3),
    /**
     * JSON list of the car class ids the layout is analysed for, laid over its document like the
     * name and width; null: the document's own list (layouts saved before the column existed).
     */
    carClasses: text("car_classes"),
    status: text("status", { enum: LAYOUT_STATUSES }).notNull().default("draft"),
    /** Optimistic concurrency: every save must name the version it started from. */
    version: integer("version").notNull().default(1),
    /** Unused since share links got their own table (share_links, hashed tokens); kept for old rows. */
    shareToken: text("share_token").unique(),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("layouts_club").on(t.clubId)],
);

/** Each save of a layout's document is a new row; the layout's `version` names the latest. */
export const layoutVersions = sqliteTable(
  "layout_versions",
  {
    id: id(),
    layoutId: text("layout_id")
      .notNull()
      .references(() => layouts.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    /** The layout document as JSON text in the product's own format (docs/layout-format.md). */
    document: text("document").notNull(),
    note: text("note"),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("layout_versions_number").on(t.layoutId, t.number)],
);

/** Uploaded files (background photos, CSV) stored through app/storage. */
export const files = sqliteTable("files", {
  id: id(),
  clubId: text("club_id")
    .notNull()
    .references(() => clubs.id, { onDelete: "cascade" }),
  storageKey: text("storage_key").notNull().unique(),
  contentType: text("content_type").notNull(),
  size: integer("size").notNull(),
  originalName: text("original_name").notNull(),
  createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
  createdAt: createdAt(),
});

/**
 * A saved version a director published for race day (docs/decisions/0800-publishing-model.md).
 * Marshals and drivers read the latest one not withdrawn; every one keeps its own address.
 */
export const publishedVersions = sqliteTable(
  "published_versions",
  {
    id: id(),
    layoutId: text("layout_id")
      .notNull()
      .references(() => layouts.id, { onDelete: "cascade" }),
    /** The layout_versions number that was published. */
    versionNumber: integer("version_number").notNull(),
    /** Race day, "YYYY-MM-DD"; null for layouts published before race dates were kept. */
    raceDate: text("race_date"),
    note: text("note").notNull().default(""),
    publishedBy: text("published_by").references(() => users.id, { onDelete: "set null" }),
    publishedAt: integer("published_at", { mode: "timestamp_ms" })
      .notNull()
      .default(sql`(unixepoch() * 1000)`),
    withdrawnAt: integer("withdrawn_at", { mode: "timestamp_ms" }),
    withdrawnReason: text("withdrawn_reason"),
    withdrawnBy: text("withdrawn_by").references(() => users.id, { onDelete: "set null" }),
  },
  (t) => [
    index("published_versions_layout").on(t.layoutId, t.versionNumber),
    foreignKey({
      columns: [t.layoutId, t.versionNumber],
      foreignColumns: [layoutVersions.layoutId, layoutVersions.number],
      name: "published_versions_version_fk",
    }).onDelete("cascade"),
  ],
);

/** A read-only link to a published version that works signed out; only the token's SHA-256 is kept. */
export const shareLinks = sqliteTable(
  "share_links",
  {
    id: id(),
    layoutId: text("layout_id")
      .notNull()
      .references(() => layouts.id, { onDelete: "cascade" }),
    publicationId: text("publication_id")
      .notNull()
      .references(() => publishedVersions.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
  },
  (t) => [index("share_links_layout").on(t.layoutId)],
);

/** A member's own car: a car profile (JSON, degrees for angles) started from a class preset. */
export const carProfiles = sqliteTable(
  "car_profiles",
  {
    id: id(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    /** The class preset it started from: its values count as estimates until changed. */
    presetId: text("preset_id").notNull(),
    /** The profile as JSON in the car profile format (app/analysis/format/car-schema.ts). */
    profile: text("profile").notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("car_profiles_user").on(t.userId)],
);

/** The car (a class id or "profile:<id>") and skill a member last chose on a layout, jump or plan page. */
export const readerChoices = sqliteTable("reader_choices", {
  userId: text("user_id")
    .primaryKey()
    .references(() => users.id, { onDelete: "cascade" }),
  car: text("car"),
  skill: text("skill"),
  updatedAt: updatedAt(),
});
