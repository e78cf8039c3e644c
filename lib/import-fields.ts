import { z } from "zod";
import { CHARGES, DEGASSING_METHODS, PROCESSES } from "../rules/case";
import { CHARGE_LABELS, DEGASSING_LABELS, OUTCOME_LABELS, PROCESS_LABELS } from "./labels";
import type { Quantity } from "./units";

/**
 * The fields an old pour log's columns can be mapped to: each row of the file is one casting with its
 * melt's conditions (rows with the same melt conditions become one melt). Measured fields say their
 * quantity, so each column picks its own unit. Shared by the import screen and the server.
 */
type Kind = "text" | "date" | "number" | "yes-no" | "choice";
export type ImportField = {
  key: string;
  label: string;
  of: "melt" | "casting";
  /** The melt or casting input's own name for it (MeltInput / CastingInput). */
  input: string;
  kind: Kind;
  quantity?: Quantity;
  choices?: Record<string, string>;
  required?: boolean;
  /** Other headings old logs use for it ("Mould moisture" for the sand's water). */
  also?: string[];
};

const OUTCOMES = { good: OUTCOME_LABELS.good, rework: OUTCOME_LABELS.rework, scrap: OUTCOME_LABELS.scrap };
const byCode = <T extends string>(codes: readonly T[], labels: Record<T, string>) =>
  Object.fromEntries(codes.map((c) => [c, labels[c]]));

export const IMPORT_FIELDS: ImportField[] = [
  { key: "pouredOn", label: "Poured on", of: "melt", input: "pouredOn", kind: "date", required: true },
  { key: "alloy", label: "Alloy", of: "melt", input: "alloy", kind: "text", required: true },
  {
    key: "process",
    label: "Process",
    of: "melt",
    input: "process",
    kind: "choice",
    choices: byCode(PROCESSES, PROCESS_LABELS),
    required: true,
  },
  {
    key: "charge",
    label: "Charge",
    of: "melt",
    input: "charge",
    kind: "choice",
    choices: byCode(CHARGES, CHARGE_LABELS),
  },
  { key: "furnace", label: "Furnace", of: "melt", input: "furnace", kind: "text" },
  {
    key: "meltTemp",
    label: "Hottest the melt got",
    of: "melt",
    input: "meltTempC",
    kind: "number",
    quantity: "temperature",
  },
  {
    key: "pourTemp",
    label: "Pour temperature",
    of: "melt",
    input: "pourTempC",
    kind: "number",
    quantity: "temperature",
  },
  {
    key: "degassing",
    label: "Degassing",
    of: "melt",
    input: "degassing",
    kind: "choice",
    choices: byCode(DEGASSING_METHODS, DEGASSING_LABELS),
  },
  { key: "degasMinutes", label: "Degassing minutes", of: "melt", input: "degasMinutes", kind: "number" },
  { key: "fluxed", label: "Flux used", of: "melt", input: "fluxed", kind: "yes-no" },
  { key: "skimmed", label: "Skimmed", of: "melt", input: "skimmed", kind: "yes-no" },
  {
    key: "ambientTemp",
    label: "Air temperature",
    of: "melt",
    input: "ambientTempC",
    kind: "number",
    quantity: "temperature",
  },
  { key: "humidityPct", label: "Humidity %", of: "melt", input: "humidityPct", kind: "number" },
  {
    key: "sandMoisturePct",
    label: "Sand moisture %",
    of: "melt",
    input: "sandMoisturePct",
    kind: "number",
    also: ["Mould moisture %", "Mould moisture", "Moisture %", "Moisture"],
  },
  { key: "coatingApplied", label: "Coating applied", of: "melt", input: "coatingApplied", kind: "yes-no" },
  { key: "coatingDried", label: "Coating dried", of: "melt", input: "coatingDried", kind: "yes-no" },
  { key: "coatingCoats", label: "Coats of coating", of: "melt", input: "coatingCoats", kind: "number" },
  {
    key: "foamDensity",
    label: "Foam density",
    of: "melt",
    input: "foamDensityKgM3",
    kind: "number",
    quantity: "density",
  },
  {
    key: "chargeWeight",
    label: "Charge weight",
    of: "melt",
    input: "chargeWeightKg",
    kind: "number",
    quantity: "mass",
    also: ["Metal charged", "Charged weight"],
  },
  { key: "meltNotes", label: "Melt notes", of: "melt", input: "notes", kind: "text" },
  { key: "partName", label: "Part name", of: "casting", input: "partName", kind: "text", required: true },
  { key: "pattern", label: "Pattern", of: "casting", input: "pattern", kind: "text" },
  {
    key: "minSection",
    label: "Thinnest section",
    of: "casting",
    input: "minSectionMm",
    kind: "number",
    quantity: "length",
  },
  {
    key: "maxSection",
    label: "Thickest section",
    of: "casting",
    input: "maxSectionMm",
    kind: "number",
    quantity: "length",
  },
  {
    key: "sprueHeight",
    label: "Sprue height",
    of: "casting",
    input: "sprueHeightMm",
    kind: "number",
    quantity: "length",
  },
  { key: "pourTimeS", label: "Pour time (s)", of: "casting", input: "pourTimeS", kind: "number" },
  { key: "hasRiser", label: "Riser", of: "casting", input: "hasRiser", kind: "yes-no" },
  { key: "hasOverflow", label: "Overflow", of: "casting", input: "hasOverflow", kind: "yes-no" },
  { key: "hasVents", label: "Vents", of: "casting", input: "hasVents", kind: "yes-no" },
  { key: "orientation", label: "Orientation", of: "casting", input: "orientation", kind: "text" },
  {
    key: "castingWeight",
    label: "Casting weight",
    of: "casting",
    input: "castingWeightKg",
    kind: "number",
    quantity: "mass",
    also: ["Weight", "Casting wt", "Net weight"],
  },
  {
    key: "pouredWeight",
    label: "Poured weight",
    of: "casting",
    input: "pouredWeightKg",
    kind: "number",
    quantity: "mass",
    also: ["Metal poured", "Pour weight", "Gross weight", "Shot weight"],
  },
  { key: "outcome", label: "Outcome", of: "casting", input: "outcome", kind: "choice", choices: OUTCOMES },
  { key: "castingNotes", label: "Casting notes", of: "casting", input: "notes", kind: "text" },
];

export const importFieldOf = (key: string) => IMPORT_FIELDS.find((f) => f.key === key);

/** The units a column of each quantity may be written in (the same choices as a person's units). */
export const UNITS_OF: Partial<Record<Quantity, readonly string[]>> = {
  temperature: ["C", "F"],
  length: ["mm", "in"],
  mass: ["kg", "lb"],
  density: ["kg", "lb"], // kg/m³ or lb/ft³, following the person's mass unit as the forms do
};

export const MAX_IMPORT_COLUMNS = 100;
const FIELD_KEYS = IMPORT_FIELDS.map((f) => f.key) as [string, ...string[]];

/** Which column feeds which field, and in what unit. A column left out is not imported. */
export const importMapping = z
  .array(
    z
      .object({
        column: z
          .number()
          .int()
          .min(0)
          .max(MAX_IMPORT_COLUMNS - 1, `at most ${MAX_IMPORT_COLUMNS} columns`),
        field: z.enum(FIELD_KEYS, { error: "not a field the notebook keeps" }),
        unit: z.enum(["C", "F", "mm", "in", "kg", "lb"], { error: "°C/°F, mm/in or kg/lb" }).optional(),
      })
      .strict()
      .superRefine((m, ctx) => {
        const q = importFieldOf(m.field)?.quantity;
        const allowed = q ? UNITS_OF[q] : undefined;
        if (allowed && (!m.unit || !allowed.includes(m.unit)))
          ctx.addIssue({ code: "custom", path: ["unit"], message: `say the unit: ${allowed.join(" or ")}` });
        if (!allowed && m.unit) ctx.addIssue({ code: "custom", path: ["unit"], message: "this field has no unit" });
      }),
  )
  .max(MAX_IMPORT_COLUMNS)
  .superRefine((list, ctx) => {
    const fields = list.map((m) => m.field);
    const twice = fields.find((f, i) => fields.indexOf(f) !== i);
    if (twice) ctx.addIssue({ code: "custom", message: `"${importFieldOf(twice)?.label}" is mapped from two columns` });
    for (const f of IMPORT_FIELDS.filter((x) => x.required))
      if (!fields.includes(f.key)) ctx.addIssue({ code: "custom", message: `map a column to "${f.label}"` });
  });
export type ImportMapping = z.infer<typeof importMapping>;

const squash = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, "");
/** How much of a heading a field's key or label starts (0: neither). */
const prefixLength = (words: string, f: ImportField) =>
  Math.max(...[f.key, f.label].map(squash).map((n) => (words.startsWith(n) ? n.length : 0)));

/** A first guess from the header words ("Pour temp (F)" -> pour temperature in °F); the owner corrects it. */
export function guessMapping(headers: string[]): ImportMapping {
  const out: ImportMapping = [];
  headers.forEach((h, column) => {
    const words = squash(h);
    const field =
      IMPORT_FIELDS.find(
        (f) =>
          squash(f.key) === words ||
          squash(f.label) === words ||
          squash(f.input) === words ||
          (f.also ?? []).some((a) => squash(a) === words),
      ) ??
      // The longest name that starts the heading: "Charge weight (kg)" is the charge weight, not the charge.
      IMPORT_FIELDS.map((f) => ({ f, starts: prefixLength(words, f) }))
        .filter((x) => words.length > 3 && x.starts > 0)
        .sort((a, b) => b.starts - a.starts)[0]?.f;
    if (!field || out.some((m) => m.field === field.key)) return;
    const allowed = field.quantity ? UNITS_OF[field.quantity] : undefined;
    const unit = allowed?.find((u) => new RegExp(`(\\(|_|\\s|°)${u}\\)?$`, "i").test(h.trim())) ?? allowed?.[0];
    out.push(
      unit ? { column, field: field.key, unit: unit as ImportMapping[number]["unit"] } : { column, field: field.key },
    );
  });
  return out;
}

// ---- Answers (server/import/service.ts) ----
export type RowStatus = "new" | "already-imported" | "repeated-in-file" | "refused";
export type PreviewRow = {
  line: number;
  status: RowStatus;
  partName: string | null;
  pouredOn: string | null;
  problems: Record<string, string>;
};
/** What an import would do, row by row; `mappingProblems` when the columns are not mapped well enough to try. */
export type ImportPreview = {
  headers: string[];
  /** The first row's cells, to show beside each header. */
  sample: string[];
  mapping: ImportMapping;
  mappingProblems: string[];
  rows: PreviewRow[];
  counts: Record<RowStatus, number>;
};
export type ImportResult = {
  imported: number;
  melts: number;
  counts: Record<RowStatus, number>;
  refused: PreviewRow[];
};
