import { relations, sql } from "drizzle-orm";
import { index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";

// Timestamps are stored as Unix milliseconds; the auth adapter reads and writes them as Dates.
const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(cast(unixepoch('subsecond') * 1000 as integer))`);
const updatedAt = () =>
  integer("updated_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(cast(unixepoch('subsecond') * 1000 as integer))`);

// ── Sign-in (the tables the auth library expects) ──────────────────────────────────────────────

export const user = sqliteTable("user", {
  id: text("id").primaryKey(),
  name: text("name").notNull(),
  email: text("email").notNull().unique(),
  emailVerified: integer("email_verified", { mode: "boolean" }).notNull().default(false),
  image: text("image"),
  /** The length units this person reads: "mm" or "in". */
  units: text("units").notNull().default("mm"),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const session = sqliteTable(
  "session",
  {
    id: text("id").primaryKey(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    token: text("token").notNull().unique(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    ipAddress: text("ip_address"),
    userAgent: text("user_agent"),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    activeOrganizationId: text("active_organization_id"),
  },
  (t) => [index("session_user_idx").on(t.userId)],
);

export const account = sqliteTable(
  "account",
  {
    id: text("id").primaryKey(),
    accountId: text("account_id").notNull(),
    providerId: text("provider_id").notNull(),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    accessToken: text("access_token"),
    refreshToken: text("refresh_token"),
    idToken: text("id_token"),
    accessTokenExpiresAt: integer("access_token_expires_at", { mode: "timestamp_ms" }),
    refreshTokenExpiresAt: integer("refresh_token_expires_at", { mode: "timestamp_ms" }),
    scope: text("scope"),
    password: text("password"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("account_user_idx").on(t.userId)],
);

export const verification = sqliteTable(
  "verification",
  {
    id: text("id").primaryKey(),
    identifier: text("identifier").notNull(),
    value: text("value").notNull(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("verification_identifier_idx").on(t.identifier)],
);

// ── Shops: the auth library's organizations, with our roles ───────────────────────────────────

/** A shop: the workspace every library entity, study and job belongs to. */
export const organization = sqliteTable("organization", {
  id: text("id").primaryKey(),
  name: text("name").notNull(),
  slug: text("slug").notNull().unique(),
  logo: text("logo"),
  metadata: text("metadata"),
  createdAt: createdAt(),
});

export const member = sqliteTable(
  "member",
  {
    id: text("id").primaryKey(),
    organizationId: text("organization_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    /** "owner" | "builder" | "customer" */
    role: text("role").notNull().default("builder"),
    createdAt: createdAt(),
  },
  (t) => [
    index("member_org_idx").on(t.organizationId),
    index("member_user_idx").on(t.userId),
    uniqueIndex("member_org_user_unique").on(t.organizationId, t.userId),
  ],
);

export const invitation = sqliteTable(
  "invitation",
  {
    id: text("id").primaryKey(),
    organizationId: text("organization_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: text("role"),
    status: text("status").notNull().default("pending"),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    createdAt: createdAt(),
    inviterId: text("inviter_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
  },
  (t) => [index("invitation_org_idx").on(t.organizationId), index("invitation_email_idx").on(t.email)],
);

/** A shop's own settings: the units it reads by default and its limits (JSON, checked by the core's schema). */
export const shopSettings = sqliteTable("shop_settings", {
  organizationId: text("organization_id")
    .primaryKey()
    .references(() => organization.id, { onDelete: "cascade" }),
  units: text("units").notNull().default("mm"),
  limitsJson: text("limits_json").notNull().default("{}"),
  /** The shop's prices: ISO 4217 code, labour rate per hour in minor units (null: not set), tax and deposit shares in percent. */
  currency: text("currency").notNull().default("EUR"),
  labourRateMinor: integer("labour_rate_minor"),
  taxPercent: real("tax_percent").notNull().default(0),
  depositPercent: real("deposit_percent").notNull().default(30),
  version: integer("version").notNull().default(1),
  updatedAt: updatedAt(),
});

export const userRelations = relations(user, ({ many }) => ({
  sessions: many(session),
  accounts: many(account),
  memberships: many(member),
}));
export const organizationRelations = relations(organization, ({ many, one }) => ({
  members: many(member),
  invitations: many(invitation),
  settings: one(shopSettings),
}));
export const memberRelations = relations(member, ({ one }) => ({
  organization: one(organization, { fields: [member.organizationId], references: [organization.id] }),
  user: one(user, { fields: [member.userId], references: [user.id] }),
}));
export const sessionRelations = relations(session, ({ one }) => ({
  user: one(user, { fields: [session.userId], references: [user.id] }),
}));
export const accountRelations = relations(account, ({ one }) => ({
  user: one(user, { fields: [account.userId], references: [user.id] }),
}));
export const invitationRelations = relations(invitation, ({ one }) => ({
  organization: one(organization, { fields: [invitation.organizationId], references: [organization.id] }),
  inviter: one(user, { fields: [invitation.inviterId], references: [user.id] }),
}));

export type User = typeof user.$inferSelect;
export type Member = typeof member.$inferSelect;
export type Shop = typeof organization.$inferSelect;
export type Invitation = typeof invitation.$inferSelect;

// ── The shop's library and its studies ─────────────────────────────────────────────────────────
// Every row belongs to one shop, says who made it, and carries a version that each update must name
// (a stale version is refused, so no edit is silently overwritten). Shapes the core checks — a case
// profile, a kit, a rig, a cut plan — are kept as JSON validated by the core's zod schemas on the way in.

const shopRef = () =>
  text("organization_id")
    .notNull()
    .references(() => organization.id, { onDelete: "cascade" });
const createdByRef = () =>
  text("created_by")
    .notNull()
    .references(() => user.id);
const version = () => integer("version").notNull().default(1);
const archivedAt = () => integer("archived_at", { mode: "timestamp_ms" });

/** A case profile: deck, mouth, studs, pockets (JSON, without its name), and the mouth readings taken on it. */
export const caseProfile = sqliteTable(
  "case_profile",
  {
    id: text("id").primaryKey(),
    organizationId: shopRef(),
    name: text("name").notNull(),
    notes: text("notes").notNull().default(""),
    dataJson: text("data_json").notNull(),
    /** Mouth diameter readings: [{ valueMm, takenById, takenByName, takenAt }]. */
    mouthReadingsJson: text("mouth_readings_json").notNull().default("[]"),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    createdBy: createdByRef(),
    archivedAt: archivedAt(),
  },
  (t) => [index("case_profile_shop_idx").on(t.organizationId, t.archivedAt)],
);

/** A cylinder kit: bore, skirt readings, studs, gaskets, price (JSON, without id and name), with who took each skirt reading. */
export const cylinderKit = sqliteTable(
  "cylinder_kit",
  {
    id: text("id").primaryKey(),
    organizationId: shopRef(),
    name: text("name").notNull(),
    notes: text("notes").notNull().default(""),
    dataJson: text("data_json").notNull(),
    /** { skirtDiameter: Reading[], skirtLength: Reading[] }, one per value in the data's reading lists. */
    readingsJson: text("readings_json").notNull().default('{"skirtDiameter":[],"skirtLength":[]}'),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    createdBy: createdByRef(),
    archivedAt: archivedAt(),
  },
  (t) => [index("cylinder_kit_shop_idx").on(t.organizationId, t.archivedAt)],
);

/** A boring rig: head, bit and its calibrated reach, grooves, shims, drill (JSON, without its name). */
export const boringRig = sqliteTable(
  "boring_rig",
  {
    id: text("id").primaryKey(),
    organizationId: shopRef(),
    name: text("name").notNull(),
    notes: text("notes").notNull().default(""),
    dataJson: text("data_json").notNull(),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    createdBy: createdByRef(),
    archivedAt: archivedAt(),
  },
  (t) => [index("boring_rig_shop_idx").on(t.organizationId, t.archivedAt)],
);

/** A study: one case, its candidate kits (study_kit), a rig, the cut plan, the holder readings and the study's own limits. */
export const study = sqliteTable(
  "study",
  {
    id: text("id").primaryKey(),
    organizationId: shopRef(),
    name: text("name").notNull(),
    notes: text("notes").notNull().default(""),
    caseId: text("case_id")
      .notNull()
      .references(() => caseProfile.id, { onDelete: "restrict" }),
    rigId: text("rig_id").references(() => boringRig.id, { onDelete: "restrict" }),
    cutJson: text("cut_json"),
    readingsJson: text("readings_json"),
    limitsJson: text("limits_json"),
    chosenKitId: text("chosen_kit_id"),
    /** A random token set by each update, so the statements of one update can tell they follow their own write. */
    writeId: text("write_id").notNull().default(""),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    createdBy: createdByRef(),
    archivedAt: archivedAt(),
  },
  (t) => [
    index("study_shop_idx").on(t.organizationId, t.archivedAt),
    index("study_case_idx").on(t.caseId),
    index("study_rig_idx").on(t.rigId),
  ],
);

/** The kits of a study, in the order the study lists them. */
export const studyKit = sqliteTable(
  "study_kit",
  {
    studyId: text("study_id")
      .notNull()
      .references(() => study.id, { onDelete: "cascade" }),
    kitId: text("kit_id")
      .notNull()
      .references(() => cylinderKit.id, { onDelete: "restrict" }),
    position: integer("position").notNull(),
  },
  (t) => [uniqueIndex("study_kit_unique").on(t.studyId, t.kitId), index("study_kit_kit_idx").on(t.kitId)],
);

/** A study's history: who changed what, and when. */
export const studyEvent = sqliteTable(
  "study_event",
  {
    id: text("id").primaryKey(),
    studyId: text("study_id")
      .notNull()
      .references(() => study.id, { onDelete: "cascade" }),
    at: integer("at", { mode: "timestamp_ms" }).notNull(),
    byId: text("by_id")
      .notNull()
      .references(() => user.id),
    byName: text("by_name").notNull(),
    summary: text("summary").notNull(),
  },
  (t) => [index("study_event_study_idx").on(t.studyId, t.at)],
);

export const studyRelations = relations(study, ({ one, many }) => ({
  case: one(caseProfile, { fields: [study.caseId], references: [caseProfile.id] }),
  rig: one(boringRig, { fields: [study.rigId], references: [boringRig.id] }),
  kits: many(studyKit),
  events: many(studyEvent),
}));
export const studyKitRelations = relations(studyKit, ({ one }) => ({
  study: one(study, { fields: [studyKit.studyId], references: [study.id] }),
  kit: one(cylinderKit, { fields: [studyKit.kitId], references: [cylinderKit.id] }),
}));
export const studyEventRelations = relations(studyEvent, ({ one }) => ({
  study: one(study, { fields: [studyEvent.studyId], references: [study.id] }),
}));

export type CaseProfileRow = typeof caseProfile.$inferSelect;
export type CylinderKitRow = typeof cylinderKit.$inferSelect;
export type BoringRigRow = typeof boringRig.$inferSelect;
export type StudyRow = typeof study.$inferSelect;
export type StudyKitRow = typeof studyKit.$inferSelect;
export type StudyEventRow = typeof studyEvent.$inferSelect;

/**
 * A photo of a case profile's deck, traced over in the case form. The file lives in object storage under
 * objectKey; the row says whether it was checked (pending → ready, or refused with the reason). Shop staff
 * only: a customer never sees it. widthPx and heightPx are the upright size the browser read.
 */
export const casePhoto = sqliteTable(
  "case_photo",
  {
    id: text("id").primaryKey(),
    caseId: text("case_id")
      .notNull()
      .references(() => caseProfile.id, { onDelete: "cascade" }),
    organizationId: shopRef(),
    objectKey: text("object_key").notNull().unique(),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    widthPx: integer("width_px"),
    heightPx: integer("height_px"),
    state: text("state").notNull().default("pending"),
    refusedReason: text("refused_reason"),
    /** The reference points the photo was scaled or squared up by (model/schemas/case-photos.ts), JSON; null until set. */
    referenceJson: text("reference_json"),
    createdAt: createdAt(),
    createdBy: createdByRef(),
  },
  (t) => [index("case_photo_case_idx").on(t.caseId, t.state)],
);

export type CasePhotoRow = typeof casePhoto.$inferSelect;
