import type { CalcQuantity, CalculatorKind } from "../rules/calculators";
import { GATING_POSITIONS, PROCESSES } from "../rules/case";
import { GATING_RATIOS } from "../rules/calculators/gating";
import { valueWord } from "../rules/value-words";
import { fromField, readingNumber, takesInchFractions, toField, unitLabel, type Quantity, type Units } from "./units";

/** What each calculator asks for, in the order a caster has the figures to hand. */
export type CalcField =
  | { key: string; label: string; type: "number"; quantity: CalcQuantity; showIf?: [string, string[]] }
  | {
      key: string;
      label: string;
      type: "choice";
      options: readonly { value: string; label: string }[];
      showIf?: [string, string[]];
    }
  | { key: "alloy"; label: string; type: "alloy" };

const alloy = { key: "alloy", label: "Alloy", type: "alloy" } as const;
const num = (key: string, label: string, quantity: CalcQuantity, showIf?: [string, string[]]): CalcField => ({
  key,
  label,
  type: "number",
  quantity,
  showIf,
});
const processes = PROCESSES.map((p) => ({ value: p, label: valueWord(p) }));

export const CALCULATOR_TITLES: Record<CalculatorKind, { title: string; purpose: string; pour: boolean }> = {
  "pour-temperature": {
    title: "Pour temperature",
    purpose: "The window to aim for and the melt to reach.",
    pour: true,
  },
  metal: {
    title: "Metal to melt",
    purpose: "From the pattern, a foam pattern's weight or a previous casting.",
    pour: true,
  },
  pattern: { title: "Pattern size", purpose: "The pattern's sizes and the shrink rule for the alloy.", pour: false },
  riser: { title: "Riser", purpose: "A section's modulus, a riser that freezes later, its neck.", pour: false },
  gating: {
    title: "Gating",
    purpose: "How fast the metal enters, against the critical ingate velocity.",
    pour: true,
  },
  hydrogen: { title: "Hydrogen", purpose: "The most hydrogen the melt could hold: an upper bound.", pour: true },
};

export const CALCULATOR_FIELDS: Record<CalculatorKind, CalcField[]> = {
  "pour-temperature": [
    alloy,
    { key: "process", label: "Process", type: "choice", options: processes },
    num("minSectionMm", "Thinnest section", "length"),
    num("plannedPourC", "Planned pour temperature", "temperature"),
    num("transferLossC", "Transfer loss, furnace to mould", "temperature-difference"),
  ],
  metal: [
    alloy,
    {
      key: "method",
      label: "Work it out from",
      type: "choice",
      options: [
        { value: "volume", label: "pattern volume" },
        { value: "foam", label: "foam pattern weight" },
        { value: "previous", label: "a previous casting" },
      ],
    },
    num("volumeCm3", "Pattern volume", "volume-cm3", ["method", ["volume"]]),
    num("foamMassKg", "Foam pattern weight, before glue and coating", "mass", ["method", ["foam"]]),
    num("foamDensityKgM3", "Foam density", "density", ["method", ["foam"]]),
    num("previousCastingKg", "Previous casting's weight", "mass", ["method", ["previous"]]),
    num("yieldPct", "Casting yield", "percent"),
    num("meltLossPct", "Melt loss", "percent"),
    num("crucibleKg", "Crucible capacity", "mass"),
  ],
  pattern: [
    alloy,
    num("lengthMm", "Length", "length"),
    num("widthMm", "Width", "length"),
    num("heightMm", "Height", "length"),
  ],
  riser: [
    {
      key: "shape",
      label: "Section",
      type: "choice",
      options: [
        { value: "plate", label: "plate" },
        { value: "bar", label: "bar" },
        { value: "cylinder", label: "cylinder" },
        { value: "typed", label: "V and A typed in" },
      ],
    },
    num("lengthMm", "Length", "length", ["shape", ["plate", "bar"]]),
    num("widthMm", "Width", "length", ["shape", ["plate", "bar"]]),
    num("thicknessMm", "Thickness", "length", ["shape", ["plate", "bar"]]),
    num("diameterMm", "Diameter", "length", ["shape", ["cylinder"]]),
    num("heightMm", "Height", "length", ["shape", ["cylinder"]]),
    num("volumeCm3", "Volume", "volume-cm3", ["shape", ["typed"]]),
    num("areaCm2", "Cooling area", "area-cm2", ["shape", ["typed"]]),
    num("mouldConstantMinPerCm2", "Mould constant C_m", "min-per-cm2"),
  ],
  gating: [
    num("sprueHeightMm", "Sprue height, cup level to sprue base", "length"),
    num("chokeAreaCm2", "Sprue-base (choke) area", "area-cm2"),
    {
      key: "ingateFrom",
      label: "Ingates from",
      type: "choice",
      options: [
        { value: "ratio", label: "a gating ratio" },
        { value: "area", label: "their area" },
      ],
    },
    {
      key: "gatingRatio",
      label: "Sprue : runner : ingate",
      type: "choice",
      options: GATING_RATIOS.map((r) => ({ value: r, label: r })),
      showIf: ["ingateFrom", ["ratio"]],
    },
    num("ingateAreaCm2", "Ingate area, all together", "area-cm2", ["ingateFrom", ["area"]]),
    {
      key: "position",
      label: "Gated at the",
      type: "choice",
      options: GATING_POSITIONS.map((p) => ({ value: p, label: p })),
    },
    num("minSectionMm", "Thinnest section", "length"),
    num("castingVolumeCm3", "Casting volume with risers", "volume-cm3"),
  ],
  hydrogen: [
    alloy,
    num("meltTempC", "Melt temperature", "temperature"),
    num("airTempC", "Air temperature", "temperature"),
    num("humidityPct", "Humidity", "percent"),
  ],
};

const PERSON_UNITS: Partial<Record<CalcQuantity, Quantity>> = {
  temperature: "temperature",
  "temperature-difference": "temperature-difference",
  length: "length",
  mass: "mass",
  density: "density",
  velocity: "velocity",
};
/**
 * Volumes and areas a person who works in inches reads in cubic and square inches: 1 in = 2.54 cm
 * exactly, so 1 in³ = 16.387064 cm³ and 1 in² = 6.4516 cm² (the 1959 international inch).
 */
const INCH_UNITS: Partial<Record<CalcQuantity, { label: string; cmPer: number }>> = {
  "volume-cm3": { label: "in³", cmPer: 2.54 ** 3 },
  "area-cm2": { label: "in²", cmPer: 2.54 ** 2 },
  "flow-cm3-per-s": { label: "in³/s", cmPer: 2.54 ** 3 },
};
const inInches = (q: CalcQuantity, u: Units) => (u.length === "in" ? INCH_UNITS[q] : undefined);
const SI_LABELS: Record<string, string> = {
  "volume-cm3": "cm³",
  "area-cm2": "cm²",
  "time-min": "min",
  "time-s": "s",
  "flow-cm3-per-s": "cm³/s",
  percent: "%",
  "solubility-cm3-per-100g": "cm³/100 g",
  "pressure-kpa": "kPa",
  "in-per-ft": "in/ft",
  "min-per-cm2": "min/cm²",
};

/** The unit a calculator's number is typed and shown in: the person's where they chose one. */
export function calcUnit(q: CalcQuantity, u: Units): string {
  const p = PERSON_UNITS[q];
  return p ? unitLabel(p, u) : (inInches(q, u)?.label ?? SI_LABELS[q]);
}
/** A length in inches takes fractions (1 1/2), and so a keyboard with / and a space. */
export const calcTakesFractions = (q: CalcQuantity, u: Units) => takesInchFractions(PERSON_UNITS[q] ?? null, u);
export function calcToField(q: CalcQuantity, si: number | undefined, u: Units): string {
  const p = PERSON_UNITS[q];
  if (si === undefined || !Number.isFinite(si)) return "";
  if (p) return toField(p, si, u);
  const inch = inInches(q, u);
  return String(Number((inch ? si / inch.cmPer : si).toFixed(3)));
}
export function calcFromField(q: CalcQuantity, text: string, u: Units): number | undefined {
  const p = PERSON_UNITS[q];
  if (p) return fromField(p, text, u);
  const t = text.trim().replace(",", ".");
  if (t === "") return undefined;
  const n = Number(t);
  if (!Number.isFinite(n)) return Number.NaN;
  return n * (inInches(q, u)?.cmPer ?? 1);
}
/** A result for reading, rounded as a caster writes it (lib/units.ts): "760 °C", "5.9 in", "12.5 lb", "0.75 cm³/100 g". */
export function calcFormat(q: CalcQuantity, si: number, u: Units): string {
  const p = PERSON_UNITS[q];
  if (p) return `${readingNumber(p, si, u)} ${unitLabel(p, u)}`;
  const inch = inInches(q, u);
  if (inch) return `${Number((si / inch.cmPer).toPrecision(3))} ${inch.label}`;
  return `${Number(si.toPrecision(3))} ${SI_LABELS[q]}`;
}

type LoggedGating = {
  sprueHeightMm: number | null;
  chokeAreaMm2: number | null;
  ingateAreaMm2: number | null;
  gatingRatio: string | null;
  gating: string | null;
};
/**
 * The gating calculator opened from a casting starts from the gating it logged: areas in cm² as the
 * calculator asks, the ratio when it is one of those offered, otherwise the ingate area.
 */
export function gatingPrefill(c: LoggedGating): Record<string, string | number | undefined> {
  const ratio = GATING_RATIOS.find((r) => r === c.gatingRatio?.replace(/\s/g, ""));
  const cm2 = (mm2: number | null) => (mm2 === null ? undefined : mm2 / 100);
  return {
    sprueHeightMm: c.sprueHeightMm ?? undefined,
    chokeAreaCm2: cm2(c.chokeAreaMm2),
    ingateFrom: ratio ? "ratio" : c.ingateAreaMm2 !== null ? "area" : undefined,
    gatingRatio: ratio,
    ingateAreaCm2: cm2(c.ingateAreaMm2),
    position: c.gating ?? undefined,
  };
}
