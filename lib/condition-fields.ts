import { z } from "zod";
import type { Metal } from "../rules/alloys";
import { valueWord } from "../rules/value-words";
import {
  caseSchema,
  COATING_PERMEABILITIES,
  CRUCIBLES,
  FOAM_TYPES,
  GATING_POSITIONS,
  MODIFIERS,
  SAND_FEELS,
  SAND_TYPES,
  type Process,
} from "../rules/case";
import type { Quantity } from "./units";

/**
 * The pour conditions beyond the everyday ones: melt treatment per metal, the sand, the mould, the foam
 * and the gating. Each is an input of the diagnosis contract (rules/case.ts), so the stored casting is
 * diagnosed with everything the rules can read; the checks are the contract's own. The forms show a
 * field only where it applies (the metal of the alloy, the process), and every one may stay empty.
 */
export type ConditionContext = { process: Process | null; metal?: Metal };
type Base = { key: string; label: string; shows: (c: ConditionContext) => boolean };
export type ConditionField = Base &
  (
    | { kind: "number"; quantity: Quantity | null; unit?: string; whole?: boolean; signed?: boolean }
    | { kind: "choice"; options: readonly { value: string; label: string }[] }
    | { kind: "yes-no" }
    | { kind: "text"; placeholder?: string }
  );
export type ConditionGroup = { heading: string; fields: ConditionField[] };

const words = (values: readonly string[], labels: Record<string, string> = {}) =>
  values.map((v) => ({ value: v, label: labels[v] ?? valueWord(v) }));
const always = () => true;
const metalIs = (m: Metal) => (c: ConditionContext) => c.metal === m;
const processIn =
  (...ps: Process[]) =>
  (c: ConditionContext) =>
    c.process !== null && ps.includes(c.process);
const SAND: Process[] = ["green-sand", "no-bake-sand", "lost-foam"];

export const MELT_CONDITIONS: ConditionGroup[] = [
  {
    heading: "Melt treatment",
    fields: [
      { key: "crucible", label: "Crucible", kind: "choice", options: words(CRUCIBLES), shows: always },
      {
        key: "degasToPourMin",
        label: "Minutes from degassing to the pour",
        kind: "number",
        quantity: null,
        unit: "min",
        shows: metalIs("aluminium"),
      },
      {
        key: "densityIndexPct",
        label: "Density index (reduced-pressure test)",
        kind: "number",
        quantity: null,
        unit: "%",
        shows: metalIs("aluminium"),
      },
      { key: "grainRefined", label: "Grain refiner added", kind: "yes-no", shows: metalIs("aluminium") },
      {
        key: "modifier",
        label: "Modifier",
        kind: "choice",
        options: words(MODIFIERS, { none: "none" }),
        shows: metalIs("aluminium"),
      },
      {
        key: "deoxidised",
        label: "Deoxidised just before the pour (phosphor copper)",
        kind: "yes-no",
        shows: metalIs("copper"),
      },
      { key: "meltCarbonPct", label: "Carbon", kind: "number", quantity: null, unit: "%", shows: metalIs("iron") },
      { key: "meltSiliconPct", label: "Silicon", kind: "number", quantity: null, unit: "%", shows: metalIs("iron") },
      { key: "inoculated", label: "Inoculated", kind: "yes-no", shows: metalIs("iron") },
      {
        key: "treatmentToPourMin",
        label: "Minutes from treatment to the pour",
        kind: "number",
        quantity: null,
        unit: "min",
        shows: metalIs("iron"),
      },
    ],
  },
  {
    heading: "More on the sand and mould",
    fields: [
      {
        key: "sandType",
        label: "Sand bonded with",
        kind: "choice",
        options: words(SAND_TYPES, { "synthetic-bentonite": "bentonite (synthetic sand)" }),
        shows: processIn(...SAND),
      },
      {
        key: "sandCompactabilityPct",
        label: "Compactability",
        kind: "number",
        quantity: null,
        unit: "%",
        shows: processIn("green-sand"),
      },
      {
        key: "greenStrengthKPa",
        label: "Green compression strength",
        kind: "number",
        quantity: null,
        unit: "kPa",
        shows: processIn("green-sand"),
      },
      {
        key: "sandFeel",
        label: "Squeeze test",
        kind: "choice",
        options: words(SAND_FEELS, { right: "feels right" }),
        shows: processIn("green-sand"),
      },
      {
        key: "mouldTempC",
        label: "Mould or die temperature",
        kind: "number",
        quantity: "temperature",
        shows: processIn("permanent-mould", "investment", "plaster"),
      },
      {
        key: "mouldDried",
        label: "Mould and cores dried through",
        kind: "yes-no",
        shows: processIn("investment", "plaster", "green-sand", "no-bake-sand"),
      },
      {
        key: "coatingPermeability",
        label: "Coating permeability",
        kind: "choice",
        options: words(COATING_PERMEABILITIES),
        shows: processIn("lost-foam"),
      },
      {
        key: "foamType",
        label: "Foam",
        kind: "choice",
        options: words(FOAM_TYPES, { eps: "EPS", pmma: "PMMA" }),
        shows: processIn("lost-foam"),
      },
      { key: "glueJoints", label: "Glued joints in the pattern", kind: "yes-no", shows: processIn("lost-foam") },
      {
        key: "sandVibrated",
        label: "Sand filled and vibrated in layers",
        kind: "yes-no",
        shows: processIn("lost-foam"),
      },
    ],
  },
];

export const CASTING_CONDITIONS: ConditionGroup[] = [
  {
    heading: "Gating",
    fields: [
      {
        key: "chokeAreaMm2",
        label: "Sprue-base (choke) area",
        kind: "number",
        quantity: null,
        unit: "mm²",
        shows: always,
      },
      {
        key: "ingateAreaMm2",
        label: "Ingate area, all together",
        kind: "number",
        quantity: null,
        unit: "mm²",
        shows: always,
      },
      {
        key: "gatingRatio",
        label: "Gating ratio sprue : runner : ingate",
        kind: "text",
        placeholder: "e.g. 1:2:4",
        shows: always,
      },
      {
        key: "gating",
        label: "Metal enters at the",
        kind: "choice",
        options: words(GATING_POSITIONS),
        shows: always,
      },
      { key: "hasFilter", label: "Filter in the runner", kind: "yes-no", shows: always },
    ],
  },
];

const s = caseSchema.shape;

/**
 * The check of each condition, taken from the diagnosis contract so the two cannot drift apart. Whether
 * a field may be empty comes from its column (lib/table-schemas.ts): every one of these may.
 */
export const meltConditionChecks = {
  crucible: s.crucible.unwrap(),
  degasToPourMin: s.degasToPourMin.unwrap(),
  densityIndexPct: s.densityIndexPct.unwrap(),
  grainRefined: s.grainRefined.unwrap(),
  modifier: s.modifier.unwrap(),
  deoxidised: s.deoxidised.unwrap(),
  meltCarbonPct: s.meltCarbonPct.unwrap(),
  meltSiliconPct: s.meltSiliconPct.unwrap(),
  inoculated: s.inoculated.unwrap(),
  treatmentToPourMin: s.treatmentToPourMin.unwrap(),
  sandType: s.sandType.unwrap(),
  sandCompactabilityPct: s.sandCompactabilityPct.unwrap(),
  greenStrengthKPa: s.greenStrengthKPa.unwrap(),
  sandFeel: s.sandFeel.unwrap(),
  mouldTempC: s.mouldTempC.unwrap(),
  mouldDried: s.mouldDried.unwrap(),
  coatingPermeability: z.enum(COATING_PERMEABILITIES, { error: "low, medium or high" }),
  foamType: s.foamType.unwrap(),
  glueJoints: s.glueJoints.unwrap(),
  sandVibrated: s.sandVibrated.unwrap(),
};
export const castingConditionChecks = {
  chokeAreaMm2: s.chokeAreaMm2.unwrap(),
  ingateAreaMm2: s.ingateAreaMm2.unwrap(),
  gatingRatio: s.gatingRatio.unwrap().max(20),
  gating: s.gating.unwrap(),
  hasFilter: s.hasFilter.unwrap(),
};

export type MeltConditionKey = keyof typeof meltConditionChecks;
export type CastingConditionKey = keyof typeof castingConditionChecks;
