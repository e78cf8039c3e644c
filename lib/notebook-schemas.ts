import { z } from "zod";
import { alloys, castings, comments, defectMarks, melts, personUnits } from "../db/notebook-schema";
import { CHARGES, DEFECT_LOCATIONS, DEFECT_TYPES, DEGASSING_METHODS, PROCESSES } from "../rules/case";
import type { DefectType, Process } from "../rules/case";
import { ALLOY_FAMILIES, type AlloyFamily } from "../rules/fact-catalog";
import type { DiagnosisResult } from "../rules/rank";
import { castingConditionChecks, meltConditionChecks } from "./condition-fields";
import { calendarDate, requiredText, rowId, text } from "./fields";
import { OUTCOMES } from "../rules/outcomes";
import { SI_UNITS } from "./units";
import { tableInput } from "./table-schemas";
import { castingWeightChecks, castingWeightConflicts, meltWeightChecks } from "./weight-fields";

/**
 * The notebook's input schemas and answer shapes (docs/notebook-api.md), shared by the forms and the
 * API. Values are SI: °C, mm, kg/m³, s, %. Bundled into the web app: keep server-only imports out.
 * Limits in messages are quantities in braces ("above {1700 °C}", rules/quantity-text.ts): the server
 * answers them in SI and as templates, and a form says them in the person's units (lib/field-errors.ts).
 * The melt, casting and mark fields are the tables' columns (lib/table-schemas.ts): which fields exist
 * and which may be empty come from db/notebook-schema.ts (a nullable column accepts null, so a form can
 * clear it on PATCH); each field's check is written here.
 */
const list = (values: readonly string[]) => values.join(", ");
const opt = <T extends z.ZodType>(s: T) => s.nullable().optional();
const isNum = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);
/** Cross-field checks run even when a single field is already wrong, so a form shows every problem at once. */
const always = { when: (p: { value: unknown }) => typeof p.value === "object" && p.value !== null };
/** The scale tops out at 1,700 °C, as the diagnosis does: iron pours at 1,300-1,450 °C (docs/gating-and-copper-facts.md "Iron"). */
const tempC = z.number().gt(0, "must be above {0 °C}").max(1700, "above {1700 °C}");
const sectionMm = z.number().positive("must be above {0 mm}").max(5000, "above {5000 mm}");

/** A shop's own alloy; the server derives designationKey from the designation. */
export const alloyInput = tableInput(
  alloys,
  {
    designation: requiredText("give the alloy a name", 40),
    family: z.enum(ALLOY_FAMILIES, { error: `family must be one of: ${list(ALLOY_FAMILIES)}` }),
    solidusC: tempC,
    liquidusC: tempC,
    densityKgM3: z.number().min(1000, "below {1000 kg/m³}").max(20000, "above {20000 kg/m³}"),
    shrinkAllowancePct: z.number().min(0, "cannot be negative").max(5, "above 5 %"),
    siliconPct: z.number().min(0, "cannot be negative").max(30, "above 30 %"),
    sources: requiredText("say where the figures come from (or 'shop measurement')", 1000),
  },
  ["designationKey"],
).refine((a) => a.solidusC <= a.liquidusC, { path: ["solidusC"], message: "solidus is above the liquidus" });
export type AlloyInput = z.infer<typeof alloyInput>;

/** The person names the alloy; the server finds its row (alloyId) in the shop's alloy table. */
export const meltFields = tableInput(
  melts,
  {
    pouredOn: calendarDate(),
    process: z.enum(PROCESSES, { error: `process must be one of: ${list(PROCESSES)}` }),
    charge: z.enum(CHARGES, { error: `charge must be one of: ${list(CHARGES)}` }),
    furnace: text(120),
    meltTempC: tempC,
    pourTempC: tempC,
    degassing: z.enum(DEGASSING_METHODS, { error: `degassing must be one of: ${list(DEGASSING_METHODS)}` }),
    degasMinutes: z.number().min(0, "cannot be negative").max(240, "above 4 hours"),
    fluxed: z.boolean(),
    skimmed: z.boolean(),
    ambientTempC: z.number().min(-40, "below {-40 °C}").max(60, "above {60 °C}"),
    humidityPct: z.number().min(0, "0 to 100 %").max(100, "0 to 100 %"),
    sandMoisturePct: z.number().min(0, "0 to 100 %").max(100, "0 to 100 %"),
    coatingApplied: z.boolean(),
    coatingDried: z.boolean(),
    coatingCoats: z.number().int("whole coats").min(0, "cannot be negative").max(20),
    foamDensityKgM3: z.number().positive("must be above {0 kg/m³}").max(200, "above {200 kg/m³}"),
    ...meltConditionChecks,
    ...meltWeightChecks,
    notes: text(4000),
  },
  ["alloyId"],
).extend({ alloy: requiredText("choose an alloy", 40) });

type MeltLike = Partial<z.infer<typeof meltFields>>;
/** Combinations that cannot have happened, whichever field was typed last. */
export function meltConflicts(m: MeltLike): Record<string, string> {
  const out: Record<string, string> = {};
  if (isNum(m.pourTempC) && isNum(m.meltTempC) && m.meltTempC < m.pourTempC)
    out.meltTempC = "the highest melt temperature is below the pour temperature";
  if (m.degassing === "none" && (m.degasMinutes ?? 0) > 0) out.degasMinutes = "no degassing was chosen";
  if (m.coatingApplied === false && m.coatingDried) out.coatingDried = "no coating was applied";
  if (m.coatingApplied === false && (m.coatingCoats ?? 0) > 0) out.coatingCoats = "no coating was applied";
  if (typeof m.pouredOn === "string" && m.pouredOn > new Date(Date.now() + 36e5 * 36).toISOString().slice(0, 10))
    out.pouredOn = "that date has not come yet";
  return out;
}

/** The alloy-dependent check, run by the form (with the alloy list) and by the server (with the table). */
export function alloyConflicts(m: MeltLike, alloy: { designation: string; solidusC: number }): Record<string, string> {
  const out: Record<string, string> = {};
  if (isNum(m.pourTempC) && m.pourTempC <= alloy.solidusC)
    out.pourTempC = `at or below ${alloy.designation}'s solidus ({${alloy.solidusC} °C}): the metal would be solid`;
  if (isNum(m.meltTempC) && m.meltTempC <= alloy.solidusC)
    out.meltTempC = `at or below ${alloy.designation}'s solidus ({${alloy.solidusC} °C}): it never melted`;
  return out;
}

/**
 * What makes a melt worth keeping: something observed at the furnace or the mould. The date, alloy,
 * process and furnace do not count, because a new melt's form fills them in from the shop's defaults
 * and the last melt, so a melt made of them alone is a tap on "Save" with nothing typed. A caster
 * who logs a pour writes down at least a temperature, the charge, how the metal was cleaned, the day's
 * weather, the mould, or a note; any one of these keeps the melt.
 */
export const MELT_OBSERVATIONS = [
  "charge",
  "meltTempC",
  "pourTempC",
  "degassing",
  "degasMinutes",
  "fluxed",
  "skimmed",
  "ambientTempC",
  "humidityPct",
  "sandMoisturePct",
  "coatingApplied",
  "coatingDried",
  "coatingCoats",
  "foamDensityKgM3",
  "chargeWeightKg",
  "notes",
  // Every pour condition beyond the everyday ones is something observed too (lib/condition-fields.ts).
  ...(Object.keys(meltConditionChecks) as (keyof typeof meltConditionChecks)[]),
] as const satisfies readonly (keyof MeltLike)[];
export const EMPTY_MELT_MESSAGE =
  "Nothing about this melt was recorded: add a temperature, the charge, the degassing, the mould or a note before saving.";
export const meltIsEmpty = (m: MeltLike) =>
  MELT_OBSERVATIONS.every((k) => m[k] == null || (typeof m[k] === "string" && m[k].trim() === ""));

const addConflicts = (found: Record<string, string>, ctx: z.RefinementCtx) => {
  for (const [path, message] of Object.entries(found)) ctx.addIssue({ code: "custom", path: [path], message });
};
/**
 * The client's id for one save (a UUID made when the form is first saved): the same save sent twice,
 * from the offline queue or after a lost answer, makes one row. Not a column a PATCH can change.
 */
const idempotencyKey = opt(z.uuid({ error: "must be a UUID made by the app for this save" }));
export const meltInput = meltFields.extend({ idempotencyKey }).superRefine((m, ctx) => {
  addConflicts(meltConflicts(m), ctx);
  if (meltIsEmpty(m)) ctx.addIssue({ code: "custom", path: [], message: EMPTY_MELT_MESSAGE });
}, always);
export const meltPatch = meltFields.partial();
export type MeltInput = z.infer<typeof meltInput>;

/** A mark belongs to the casting in the URL; photoId, x and y pin it on one of the casting's photos. */
export const markFields = tableInput(
  defectMarks,
  {
    type: z.enum(DEFECT_TYPES, { error: `type must be one of: ${list(DEFECT_TYPES)}` }),
    location: z.enum(DEFECT_LOCATIONS, { error: `location must be one of: ${list(DEFECT_LOCATIONS)}` }),
    severity: z.number().int("1, 2 or 3").min(1, "1, 2 or 3").max(3, "1, 2 or 3"),
    photoId: rowId("must be the id of a photo of this casting"),
    /** Fractions of the photo's width and height, 0 at the top left. */
    x: z.number().min(0, "0 to 1 of the photo's width").max(1, "0 to 1 of the photo's width"),
    y: z.number().min(0, "0 to 1 of the photo's height").max(1, "0 to 1 of the photo's height"),
    note: text(500),
  },
  ["castingId"],
);
export function markConflicts(m: Partial<z.infer<typeof markFields>>): Record<string, string> {
  const out: Record<string, string> = {};
  if (m.photoId != null) {
    if (m.x == null) out.x = "place the mark on the photo";
    if (m.y == null) out.y = "place the mark on the photo";
  } else {
    if (m.x != null) out.x = "a position needs a photo";
    if (m.y != null) out.y = "a position needs a photo";
  }
  return out;
}
export const markInput = markFields.superRefine((m, ctx) => addConflicts(markConflicts(m), ctx), always);
export const markPatch = markFields.partial();
/** What the mark editor returns: the description of a mark, without its place on the photo. */
export type MarkDescription = Pick<z.infer<typeof markFields>, "type" | "location" | "severity"> & {
  note: string | null;
};
export type MarkInput = z.infer<typeof markInput>;

/** A casting belongs to the melt in the URL (meltId). */
export const castingFields = tableInput(
  castings,
  {
    partName: requiredText("name the part", 120),
    pattern: text(120),
    minSectionMm: sectionMm,
    maxSectionMm: sectionMm,
    sprueHeightMm: sectionMm,
    pourTimeS: z.number().positive("must be above 0 s").max(3600, "above an hour"),
    hasRiser: z.boolean(),
    hasOverflow: z.boolean(),
    hasVents: z.boolean(),
    ...castingConditionChecks,
    ...castingWeightChecks,
    orientation: text(120),
    outcome: z.enum(OUTCOMES, { error: "outcome is good, rework or scrap" }),
    notes: text(4000),
  },
  // The melt's day is copied onto the casting by a trigger for the list's order (db/list-schema.ts).
  ["meltId", "pouredOn"],
);
export function castingConflicts(c: Partial<z.infer<typeof castingFields>>): Record<string, string> {
  const out = castingWeightConflicts(c);
  if (isNum(c.minSectionMm) && isNum(c.maxSectionMm) && c.minSectionMm > c.maxSectionMm)
    out.minSectionMm = "the thinnest section is thicker than the thickest";
  return out;
}
/** A new casting may carry marks; a photo comes after the casting exists, so these have none. */
export const castingInput = castingFields
  .extend({
    idempotencyKey,
    marks: z
      .array(markFields.omit({ photoId: true, x: true, y: true }).strict())
      .max(50)
      .optional(),
  })
  .superRefine((c, ctx) => addConflicts(castingConflicts(c), ctx), always);
export const castingPatch = castingFields.partial();
export type CastingInput = z.infer<typeof castingInput>;
export type Outcome = NonNullable<CastingInput["outcome"]>;

export const commentInput = tableInput(comments, { body: requiredText("write something", 4000) }, ["castingId"]);

/** A person's display units (the database keeps SI whatever they choose). */
export const unitsInput = tableInput(
  personUnits,
  {
    temperature: z.enum(["C", "F"], { error: "C or F" }),
    length: z.enum(["mm", "in"], { error: "mm or in" }),
    mass: z.enum(["kg", "lb"], { error: "kg or lb" }),
  },
  ["userId"],
);
export type Units = z.infer<typeof unitsInput>;
export const DEFAULT_UNITS: Units = SI_UNITS;

/**
 * Lists page by keyset: `after` is the `next` of the previous answer (opaque; it names the sort it
 * belongs to and the last row's keys), so a page costs the same at the start and deep in the list.
 */
const listQuery = {
  after: z
    .string()
    .max(1000, "after is the next value of a previous answer")
    .regex(/^[A-Za-z0-9_-]+$/, "after is the next value of a previous answer")
    .optional(),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
};
export const MELT_SORTS = ["date-desc", "date-asc", "alloy", "castings"] as const;
export const CASTING_SORTS = ["date-desc", "date-asc", "part", "outcome"] as const;
export const meltListQuery = z.object({ ...listQuery, sort: z.enum(MELT_SORTS).default("date-desc") });
export const castingListQuery = z.object({ ...listQuery, sort: z.enum(CASTING_SORTS).default("date-desc") });

// ---- Answers (JSON: dates are ISO strings; shopId is never sent) ----
export type PersonRef = { id: string; name: string };
type Row = { id: number; createdBy: PersonRef; createdAt: string };
/** Set while a melt or casting is archived: hidden from lists, its page says so, an owner can restore it. */
export type Archived = { archivedAt: string | null; archivedBy: PersonRef | null };
/** One page of a list; `next` goes back as `after` for the page after it, null on the last page. */
export type Page<T> = { items: T[]; pageSize: number; next: string | null };

export type Alloy = {
  id: number;
  designation: string;
  family: AlloyFamily;
  solidusC: number;
  liquidusC: number;
  densityKgM3: number;
  shrinkAllowancePct: number;
  siliconPct: number | null;
  sources: string;
  /** Built-in alloys come from rules/alloys.ts and belong to no shop (createdBy null). */
  builtIn: boolean;
  createdBy: PersonRef | null;
  createdAt: string;
};
/**
 * A melt, casting or mark answers with its table's columns (db/notebook-schema.ts), so a column added
 * there is in the answer's type on the server and in the app; these are shaped apart: the shop is
 * never sent, authors are sent as a PersonRef, times as ISO strings, the retry key stays on the server.
 * `version` is raised by one on every edit and is the ETag (server/http/row-version.ts).
 */
export const SHAPED_COLUMNS = [
  "shopId",
  "createdBy",
  "createdAt",
  "updatedAt",
  "archivedAt",
  "archivedBy",
  "idempotencyKey",
] as const;
type Columns<T> = Omit<T, (typeof SHAPED_COLUMNS)[number]>;

export type Melt = Row &
  Archived &
  Omit<Columns<typeof melts.$inferSelect>, "alloyId"> & {
    /** The alloy's designation (the row holds its id). */
    alloy: string;
    updatedAt: string;
  };
export type MeltSummary = Row & {
  pouredOn: string;
  alloy: string;
  process: Process;
  furnace: string | null;
  pourTempC: number | null;
  castingCount: number;
  scrapCount: number;
};
export type Casting = Row & Archived & Columns<typeof castings.$inferSelect> & { updatedAt: string };
export type CastingSummary = Row & {
  meltId: number;
  partName: string;
  pattern: string | null;
  outcome: Outcome | null;
  /** For the melt's yield (rules/compute/casting-yield.ts). */
  castingWeightKg: number | null;
  pouredWeightKg: number | null;
  pouredOn: string;
  alloy: string;
  process: Process;
  markCount: number;
  photoCount: number;
  defectTypes: DefectType[];
  thumbUrl: string | null;
  /** For the person asking: a mentor answered on their own casting since they last opened it. */
  newAnswer: boolean;
};
export type Photo = Row & { castingId: number; width: number; height: number; imageUrl: string; thumbUrl: string };
export type Mark = Row & Columns<typeof defectMarks.$inferSelect>;
export type Comment = Row & { castingId: number; body: string };
export type DiagnosisSnapshot = {
  id: number;
  createdAt: string;
  createdBy: PersonRef;
  ruleSetVersion: string;
  result: DiagnosisResult;
};
/**
 * Whether the latest diagnosis still fits the casting: `changed` names the diagnosis contract's fields
 * that differ from what it read ("defects" for the marks).
 */
export type DiagnosisFreshness = { snapshotId: number | null; stale: boolean; changed: string[] };
export type CastingDetail = Casting & {
  melt: Melt;
  photos: Photo[];
  marks: Mark[];
  comments: Comment[];
  diagnosis: DiagnosisSnapshot | null;
};
export type MeltDetail = Melt & { castings: CastingSummary[] };
