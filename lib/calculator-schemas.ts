import { z } from "zod";
import { CALCULATORS, type CalcResult, type CalculatorInputs, type CalculatorKind } from "../rules/calculators";
import { GATING_POSITIONS, PROCESSES } from "../rules/case";
import { GATING_RATIOS, INGATE_FROM } from "../rules/calculators/gating";
import { METAL_METHODS } from "../rules/calculators/metal";
import { RISER_SHAPES } from "../rules/calculators/riser";

/** Inputs of each calculator, in SI, for the screens and the server alike. */
const positive = (what: string) => z.number({ error: `${what} is a number` }).positive(`${what} is more than 0`);
const alloy = z.string().trim().min(1, "choose an alloy").max(40);
const pct = (what: string) =>
  z
    .number({ error: `${what} is a number` })
    .min(0, `${what} is 0 % or more`)
    .max(100, `${what} is at most 100 %`);

export const calculatorInputSchemas = {
  "pour-temperature": z.strictObject({
    alloy,
    process: z.enum(PROCESSES, { error: "choose a process" }),
    minSectionMm: positive("the thinnest section").optional(),
    plannedPourC: z.number({ error: "the planned temperature is a number" }).max(1400, "at most {1400 °C}").optional(),
    transferLossC: z.number({ error: "the transfer loss is a number" }).min(0, "0 or more").max(300, "at most {300 K}"),
  }),
  metal: z.strictObject({
    alloy,
    method: z.enum(METAL_METHODS, { error: "choose how to work it out" }),
    volumeCm3: positive("the volume").optional(),
    foamMassKg: positive("the foam weight").optional(),
    foamDensityKgM3: positive("the foam density").optional(),
    previousCastingKg: positive("the casting's weight").optional(),
    yieldPct: pct("the yield").refine((v) => v > 0, "the yield is more than 0 %"),
    meltLossPct: pct("the melt loss").refine((v) => v < 100, "the melt loss is under 100 %"),
    crucibleKg: positive("the crucible capacity").optional(),
  }),
  pattern: z.strictObject({
    alloy,
    lengthMm: positive("the length"),
    widthMm: positive("the width").optional(),
    heightMm: positive("the height").optional(),
  }),
  riser: z.strictObject({
    shape: z.enum(RISER_SHAPES, { error: "choose a shape" }),
    lengthMm: positive("the length").optional(),
    widthMm: positive("the width").optional(),
    thicknessMm: positive("the thickness").optional(),
    diameterMm: positive("the diameter").optional(),
    heightMm: positive("the height").optional(),
    volumeCm3: positive("the volume").optional(),
    areaCm2: positive("the area").optional(),
    mouldConstantMinPerCm2: positive("the mould constant").optional(),
  }),
  gating: z.strictObject({
    sprueHeightMm: positive("the sprue height").max(5000, "at most 5 m"),
    chokeAreaCm2: positive("the sprue-base area").max(10000, "at most 10,000 cm²"),
    ingateFrom: z.enum(INGATE_FROM, { error: "choose a ratio or the ingates' area" }),
    gatingRatio: z.enum(GATING_RATIOS, { error: "choose a ratio sprue : runner : ingate" }).optional(),
    ingateAreaCm2: positive("the ingate area").max(10000, "at most 10,000 cm²").optional(),
    castingVolumeCm3: positive("the casting volume").optional(),
    minSectionMm: positive("the thinnest section").optional(),
    position: z.enum(GATING_POSITIONS, { error: "choose where the ingates enter" }),
  }),
  hydrogen: z.strictObject({
    alloy,
    meltTempC: z.number({ error: "the melt temperature is a number" }).max(1400, "at most {1400 °C}"),
    humidityPct: pct("the humidity").optional(),
    airTempC: z.number({ error: "the air temperature is a number" }).min(-40).max(50).optional(),
  }),
} satisfies { [K in CalculatorKind]: z.ZodType<CalculatorInputs[K]> };

/**
 * Saving a result onto a melt or a casting: the server works it out again from the input. Not built
 * from the calculations table: `input` is checked by its kind's schema above, `result` is the server's
 * own, and the melt comes from the casting when a casting is named, so the body is not one field per column.
 */
export const saveCalculationInput = z
  .strictObject({
    kind: z.enum(CALCULATORS, { error: `kind is one of: ${CALCULATORS.join(", ")}` }),
    meltId: z.number().int().positive().optional(),
    castingId: z.number().int().positive().optional(),
    input: z.record(z.string(), z.unknown(), { error: "input is an object" }),
  })
  .refine((v) => (v.meltId === undefined) !== (v.castingId === undefined), {
    message: "save onto a melt or a casting, one of them",
    path: ["meltId"],
  });

export const calculationListQuery = z
  .strictObject({
    meltId: z.coerce.number().int().positive().optional(),
    castingId: z.coerce.number().int().positive().optional(),
  })
  .refine((v) => (v.meltId === undefined) !== (v.castingId === undefined), {
    message: "ask for a melt's or a casting's results",
    path: ["meltId"],
  });

export type SavedCalculation = {
  id: number;
  kind: CalculatorKind;
  meltId: number;
  castingId: number | null;
  input: Record<string, unknown>;
  result: CalcResult;
  createdBy: { id: string; name: string };
  createdAt: string;
};
