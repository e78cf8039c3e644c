import { sql, type AnyColumn } from "drizzle-orm";
import { check } from "drizzle-orm/pg-core/checks";
import { boolean, date, doublePrecision, integer, jsonb, serial, text, timestamp } from "drizzle-orm/pg-core/columns";
import { index } from "drizzle-orm/pg-core/indexes";
import { pgTable } from "drizzle-orm/pg-core/table";
import { unique } from "drizzle-orm/pg-core/unique-constraint";
import { organization, user } from "./auth-schema";
import {
  alloyFamilyEnum,
  chargeEnum,
  coatingPermeabilityEnum,
  crucibleEnum,
  foamTypeEnum,
  gatingPositionEnum,
  modifierEnum,
  sandFeelEnum,
  sandTypeEnum,
  defectLocationEnum,
  defectTypeEnum,
  degassingEnum,
  lengthUnitEnum,
  massUnitEnum,
  outcomeEnum,
  processEnum,
  temperatureUnitEnum,
} from "./enums";

/**
 * The shop's notebook: melts, castings, photos, defect marks, comments, diagnosis snapshots.
 * Every shop row carries its shop, who made it and when. Values are SI (°C, mm, kg/m³, s, %);
 * the app converts for each person's units (person_units).
 */
const shopId = () =>
  text("shop_id")
    .notNull()
    .references(() => organization.id, { onDelete: "cascade" });
const createdBy = () =>
  text("created_by")
    .notNull()
    .references(() => user.id);
const createdAt = () => timestamp("created_at", { withTimezone: true }).defaultNow().notNull();
const updatedAt = () => timestamp("updated_at", { withTimezone: true }).defaultNow().notNull();
/**
 * The row's version for optimistic concurrency (ETag / If-Match, server/http/row-version.ts), raised by
 * one on every edit. A counter rather than updated_at: two saves can fall in the same millisecond (the
 * precision a JS Date carries) and a clock can be set back, a counter never repeats.
 */
export const rowVersionColumn = () => integer("version").default(1).notNull();

/**
 * Archiving hides a melt or casting from lists instead of deleting it, so an owner can bring it back
 * (archived_at null: in use). The idempotency key is the client's UUID for one save: a save sent again
 * after a lost answer or from the offline queue finds the row it already made (unique per shop).
 */
const archiveAndRetry = () => ({
  archivedAt: timestamp("archived_at", { withTimezone: true }),
  archivedBy: text("archived_by").references(() => user.id),
  idempotencyKey: text("idempotency_key"),
});

/** Built-in alloys (from rules/alloys.ts) have no shop and no author; a shop adds its own. */
export const alloys = pgTable(
  "alloys",
  {
    id: serial("id").primaryKey(),
    shopId: text("shop_id").references(() => organization.id, { onDelete: "cascade" }),
    designation: text("designation").notNull(),
    /** Upper case without spaces, so "a356.0" and "A356.0" are one alloy. */
    designationKey: text("designation_key").notNull(),
    family: alloyFamilyEnum("family").notNull(),
    solidusC: doublePrecision("solidus_c").notNull(),
    liquidusC: doublePrecision("liquidus_c").notNull(),
    densityKgM3: doublePrecision("density_kg_m3").notNull(),
    shrinkAllowancePct: doublePrecision("shrink_allowance_pct").notNull(),
    siliconPct: doublePrecision("silicon_pct"),
    sources: text("sources").notNull(),
    createdBy: text("created_by").references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [
    unique("alloys_shop_designation_uq").on(t.shopId, t.designationKey).nullsNotDistinct(),
    check("alloys_solidus_liquidus_ck", sql`${t.solidusC} <= ${t.liquidusC}`),
  ],
);

export const melts = pgTable(
  "melts",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    alloyId: integer("alloy_id")
      .notNull()
      .references(() => alloys.id),
    pouredOn: date("poured_on", { mode: "string" }).notNull(),
    process: processEnum("process").notNull(),
    charge: chargeEnum("charge"),
    furnace: text("furnace"),
    meltTempC: doublePrecision("melt_temp_c"),
    pourTempC: doublePrecision("pour_temp_c"),
    degassing: degassingEnum("degassing"),
    degasMinutes: doublePrecision("degas_minutes"),
    fluxed: boolean("fluxed"),
    skimmed: boolean("skimmed"),
    ambientTempC: doublePrecision("ambient_temp_c"),
    humidityPct: doublePrecision("humidity_pct"),
    sandMoisturePct: doublePrecision("sand_moisture_pct"),
    coatingApplied: boolean("coating_applied"),
    coatingDried: boolean("coating_dried"),
    coatingCoats: integer("coating_coats"),
    foamDensityKgM3: doublePrecision("foam_density_kg_m3"),
    // Conditions beyond the everyday ones (lib/condition-fields.ts): melt treatment, sand, mould, foam.
    crucible: crucibleEnum("crucible"),
    degasToPourMin: doublePrecision("degas_to_pour_min"),
    densityIndexPct: doublePrecision("density_index_pct"),
    grainRefined: boolean("grain_refined"),
    modifier: modifierEnum("modifier"),
    deoxidised: boolean("deoxidised"),
    meltCarbonPct: doublePrecision("melt_carbon_pct"),
    meltSiliconPct: doublePrecision("melt_silicon_pct"),
    inoculated: boolean("inoculated"),
    treatmentToPourMin: doublePrecision("treatment_to_pour_min"),
    sandType: sandTypeEnum("sand_type"),
    sandCompactabilityPct: doublePrecision("sand_compactability_pct"),
    greenStrengthKPa: doublePrecision("green_strength_kpa"),
    sandFeel: sandFeelEnum("sand_feel"),
    mouldTempC: doublePrecision("mould_temp_c"),
    mouldDried: boolean("mould_dried"),
    coatingPermeability: coatingPermeabilityEnum("coating_permeability"),
    foamType: foamTypeEnum("foam_type"),
    glueJoints: boolean("glue_joints"),
    sandVibrated: boolean("sand_vibrated"),
    /** Metal put in the furnace, kilograms (weighed before melting). */
    chargeWeightKg: doublePrecision("charge_weight_kg"),
    notes: text("notes"),
    createdBy: createdBy(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    version: rowVersionColumn(),
    ...archiveAndRetry(),
  },
  (t) => [
    unique("melts_shop_idempotency_uq").on(t.shopId, t.idempotencyKey),
    index("melts_shop_poured_idx").on(t.shopId, t.pouredOn, t.id),
    index("melts_shop_created_idx").on(t.shopId, t.createdAt),
    // The pour log's orders (server/melts/list-order.ts): by alloy, each alloy's melts newest first.
    index("melts_shop_alloy_poured_idx")
      .on(t.shopId, t.alloyId, t.pouredOn.desc(), t.id.desc())
      .where(sql`${t.archivedAt} is null`),
    check("melts_pour_temp_ck", sql`${t.pourTempC} is null or ${t.pourTempC} <= 1700`),
    check("melts_humidity_ck", sql`${t.humidityPct} is null or ${t.humidityPct} between 0 and 100`),
  ],
);

/** The castings list's outcome order: scrap first, then rework, good, and not judged yet. */
export const outcomeRank = (outcome: AnyColumn) =>
  sql<number>`case ${outcome} when 'scrap' then 0 when 'rework' then 1 when 'good' then 2 else 3 end`;

export const castings = pgTable(
  "castings",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    meltId: integer("melt_id")
      .notNull()
      .references(() => melts.id, { onDelete: "cascade" }),
    partName: text("part_name").notNull(),
    pattern: text("pattern"),
    /**
     * The melt's pour day, copied so the castings list can page by date on one index. Triggers keep it
     * (drizzle/*_list_keys_triggers.sql): set from the melt on insert, rewritten when the melt's day
     * changes; the default never stays.
     */
    pouredOn: date("poured_on", { mode: "string" })
      .default(sql`'epoch'`)
      .notNull(),
    minSectionMm: doublePrecision("min_section_mm"),
    maxSectionMm: doublePrecision("max_section_mm"),
    sprueHeightMm: doublePrecision("sprue_height_mm"),
    pourTimeS: doublePrecision("pour_time_s"),
    hasRiser: boolean("has_riser"),
    hasOverflow: boolean("has_overflow"),
    hasVents: boolean("has_vents"),
    chokeAreaMm2: doublePrecision("choke_area_mm2"),
    ingateAreaMm2: doublePrecision("ingate_area_mm2"),
    gatingRatio: text("gating_ratio"),
    gating: gatingPositionEnum("gating"),
    hasFilter: boolean("has_filter"),
    orientation: text("orientation"),
    /** The casting as cleaned, and all the metal poured into its mould (gating and risers too), kilograms: yield. */
    castingWeightKg: doublePrecision("casting_weight_kg"),
    pouredWeightKg: doublePrecision("poured_weight_kg"),
    outcome: outcomeEnum("outcome"),
    notes: text("notes"),
    createdBy: createdBy(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    version: rowVersionColumn(),
    ...archiveAndRetry(),
  },
  (t) => [
    unique("castings_shop_idempotency_uq").on(t.shopId, t.idempotencyKey),
    index("castings_shop_created_idx").on(t.shopId, t.createdAt),
    index("castings_melt_idx").on(t.meltId),
    index("castings_shop_part_idx").on(t.shopId, t.partName),
    // One index per order of the castings list (server/castings/list-order.ts), in-use rows only.
    index("castings_shop_poured_idx")
      .on(t.shopId, t.pouredOn, t.id)
      .where(sql`${t.archivedAt} is null`),
    index("castings_shop_part_lower_idx")
      .on(t.shopId, sql`lower(${t.partName})`, t.id.desc())
      .where(sql`${t.archivedAt} is null`),
    index("castings_shop_outcome_idx")
      .on(t.shopId, sql`(${outcomeRank(t.outcome)})`, t.pouredOn.desc(), t.id.desc())
      .where(sql`${t.archivedAt} is null`),
    check("castings_sections_ck", sql`${t.minSectionMm} is null or ${t.minSectionMm} > 0`),
    // The cleaned casting is part of the metal poured into its mould, never more (lib/weight-fields.ts).
    check(
      "castings_weights_ck",
      sql`${t.castingWeightKg} is null or ${t.pouredWeightKg} is null or ${t.castingWeightKg} <= ${t.pouredWeightKg}`,
    ),
  ],
);

/** Objects in the photo store (server/photos/object-store.ts) under random names; only GET /api/photos/:id/... serves them. */
export const photos = pgTable(
  "photos",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    castingId: integer("casting_id")
      .notNull()
      .references(() => castings.id, { onDelete: "cascade" }),
    fileName: text("file_name").notNull().unique(),
    thumbName: text("thumb_name").notNull().unique(),
    width: integer("width").notNull(),
    height: integer("height").notNull(),
    bytes: integer("bytes").notNull(),
    /** What was uploaded (image/png, image/heic...); the stored file is always a re-encoded JPEG. */
    uploadedType: text("uploaded_type").notNull(),
    createdBy: createdBy(),
    createdAt: createdAt(),
  },
  (t) => [index("photos_casting_idx").on(t.castingId), index("photos_shop_created_idx").on(t.shopId, t.createdAt)],
);

/** A defect seen on a casting, optionally pinned on one of its photos at (x, y) fractions. */
export const defectMarks = pgTable(
  "defect_marks",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    castingId: integer("casting_id")
      .notNull()
      .references(() => castings.id, { onDelete: "cascade" }),
    photoId: integer("photo_id").references(() => photos.id, { onDelete: "set null" }),
    x: doublePrecision("x"),
    y: doublePrecision("y"),
    type: defectTypeEnum("type").notNull(),
    location: defectLocationEnum("location").notNull(),
    severity: integer("severity").notNull(),
    note: text("note"),
    createdBy: createdBy(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    version: rowVersionColumn(),
  },
  (t) => [
    index("marks_casting_idx").on(t.castingId),
    index("marks_shop_type_idx").on(t.shopId, t.type),
    check("marks_severity_ck", sql`${t.severity} between 1 and 3`),
    check(
      "marks_xy_ck",
      sql`(${t.x} is null or ${t.x} between 0 and 1) and (${t.y} is null or ${t.y} between 0 and 1)`,
    ),
  ],
);

export const comments = pgTable(
  "comments",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    castingId: integer("casting_id")
      .notNull()
      .references(() => castings.id, { onDelete: "cascade" }),
    body: text("body").notNull(),
    createdBy: createdBy(),
    createdAt: createdAt(),
  },
  (t) => [index("comments_casting_idx").on(t.castingId, t.createdAt)],
);

/** A diagnosis as it was, with the rule-set version that produced it, so it reads the same later. */
export const diagnosisSnapshots = pgTable(
  "diagnosis_snapshots",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    castingId: integer("casting_id")
      .notNull()
      .references(() => castings.id, { onDelete: "cascade" }),
    ruleSetVersion: text("rule_set_version").notNull(),
    input: jsonb("input").notNull(),
    result: jsonb("result").notNull(),
    createdBy: createdBy(),
    createdAt: createdAt(),
  },
  (t) => [index("diagnosis_casting_idx").on(t.castingId, t.createdAt)],
);

/** Each person's display units; the database keeps SI whatever they choose. */
export const personUnits = pgTable("person_units", {
  userId: text("user_id")
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  temperature: temperatureUnitEnum("temperature").notNull(),
  length: lengthUnitEnum("length").notNull(),
  mass: massUnitEnum("mass").notNull(),
  updatedAt: updatedAt(),
});
