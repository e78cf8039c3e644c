import type { Units } from "../../lib/notebook-schemas";
import { fromSi, toField, type Quantity } from "../../lib/units";
import { castingYieldPct } from "../../rules/compute/casting-yield";
import type { ExportRow } from "./service";

/**
 * The export's columns, trade words with the unit in the name. A measured quantity is stored in SI and
 * written in the units asked for: the name's suffix follows (pour_temp_c or pour_temp_f), and a converted
 * value is rounded as the forms show it (a degree, a thousandth of an inch); SI values go out as stored.
 */
type Plain = [name: string, read: (r: ExportRow) => string | number];
type Measured = { base: string; q: Quantity; read: (r: ExportRow) => number | null };
type Column = Plain | Measured;

const orBlank = (v: string | null) => v ?? "";
const yesNo = (v: boolean | null) => (v === null ? "" : v ? "yes" : "no");
const num = (v: number | null) => (v === null ? "" : v);
const yieldCell = (castingKg: number | null, pouredKg: number | null) => {
  const y = castingYieldPct(castingKg, pouredKg);
  return y === undefined ? "" : Math.round(y * 10) / 10;
};

const COLUMNS: Column[] = [
  ["casting_id", (r) => r.c.id],
  ["melt_id", (r) => r.m.id],
  ["poured_on", (r) => r.m.pouredOn],
  ["alloy", (r) => r.alloy],
  ["process", (r) => r.m.process],
  ["charge", (r) => r.m.charge ?? ""],
  ["furnace", (r) => orBlank(r.m.furnace)],
  { base: "melt_temp", q: "temperature", read: (r) => r.m.meltTempC },
  { base: "pour_temp", q: "temperature", read: (r) => r.m.pourTempC },
  {
    base: "superheat",
    q: "temperature-difference",
    read: (r) => (r.m.pourTempC === null ? null : Math.round((r.m.pourTempC - r.liquidusC) * 10) / 10),
  },
  ["degassing", (r) => r.m.degassing ?? ""],
  ["degas_minutes", (r) => num(r.m.degasMinutes)],
  ["fluxed", (r) => yesNo(r.m.fluxed)],
  ["skimmed", (r) => yesNo(r.m.skimmed)],
  { base: "ambient_temp", q: "temperature", read: (r) => r.m.ambientTempC },
  ["humidity_pct", (r) => num(r.m.humidityPct)],
  ["sand_moisture_pct", (r) => num(r.m.sandMoisturePct)],
  ["coating_applied", (r) => yesNo(r.m.coatingApplied)],
  ["coating_dried", (r) => yesNo(r.m.coatingDried)],
  ["coating_coats", (r) => num(r.m.coatingCoats)],
  { base: "foam_density", q: "density", read: (r) => r.m.foamDensityKgM3 },
  { base: "charge_weight", q: "mass", read: (r) => r.m.chargeWeightKg },
  ["part_name", (r) => orBlank(r.c.partName)],
  ["pattern", (r) => orBlank(r.c.pattern)],
  { base: "min_section", q: "length", read: (r) => r.c.minSectionMm },
  { base: "max_section", q: "length", read: (r) => r.c.maxSectionMm },
  { base: "sprue_height", q: "length", read: (r) => r.c.sprueHeightMm },
  ["pour_time_s", (r) => num(r.c.pourTimeS)],
  ["riser", (r) => yesNo(r.c.hasRiser)],
  ["overflow", (r) => yesNo(r.c.hasOverflow)],
  ["vents", (r) => yesNo(r.c.hasVents)],
  ["orientation", (r) => orBlank(r.c.orientation)],
  { base: "casting_weight", q: "mass", read: (r) => r.c.castingWeightKg },
  { base: "poured_weight", q: "mass", read: (r) => r.c.pouredWeightKg },
  // A ratio, the same in any units; to a tenth of a percent, as the stored weights allow.
  ["yield_pct", (r) => yieldCell(r.c.castingWeightKg, r.c.pouredWeightKg)],
  ["outcome", (r) => r.c.outcome ?? ""],
  ["marks", (r) => r.marks],
  ["photo_count", (r) => r.photoCount],
  ["likely_cause", (r) => r.likelyCause],
  // What the shop learned: the mentor's word (the newest confirmation) and the fixes tried after it.
  ["confirmed_cause", (r) => r.confirmedCause],
  ["fix_tried", (r) => r.fixes.map((f) => f.fix).join("; ")],
  ["fix_worked", (r) => r.fixes.map((f) => f.worked ?? "not judged").join("; ")],
  ["casting_notes", (r) => orBlank(r.c.notes)],
  ["melt_notes", (r) => orBlank(r.m.notes)],
  ["logged_by", (r) => orBlank(r.byName)],
  ["logged_at", (r) => r.c.createdAt.toISOString()],
];

const SUFFIX: Record<Quantity, (u: Units) => string> = {
  temperature: (u) => (u.temperature === "F" ? "f" : "c"),
  "temperature-difference": (u) => (u.temperature === "F" ? "f" : "c"),
  length: (u) => u.length,
  mass: (u) => u.mass,
  density: (u) => (u.mass === "lb" ? "lb_ft3" : "kg_m3"),
  velocity: (u) => (u.length === "in" ? "in_s" : "m_s"),
  area: (u) => (u.length === "in" ? "in2" : "mm2"),
};

const isSi = (q: Quantity, u: Units) => fromSi(q, 1000, u) === 1000;

/** The header and a reader per column, for the units the export is written in. */
export function columnsIn(u: Units): [string, (r: ExportRow) => string | number][] {
  return COLUMNS.map((col) => {
    if (Array.isArray(col)) return col;
    const { base, q, read } = col;
    const write = (r: ExportRow) => {
      const si = read(r);
      if (si === null) return "";
      return isSi(q, u) ? si : Number(toField(q, si, u));
    };
    return [`${base}_${SUFFIX[q](u)}`, write];
  });
}
