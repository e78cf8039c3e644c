import { z } from "zod";

/**
 * One case for diagnosis: the contract shared by POST /api/diagnosis, the stored-casting diagnosis
 * and `npm run diagnose`. All values SI (°C, mm, kg/m³, s, %). Everything but defects, alloy and
 * process is optional: a missing input stays missing and is never read as zero.
 */
export const PROCESSES = [
  "green-sand",
  "no-bake-sand",
  "lost-foam",
  "investment",
  "plaster",
  "permanent-mould",
] as const;
export type Process = (typeof PROCESSES)[number];

export const DEGASSING_METHODS = ["none", "argon-lance", "nitrogen-lance", "rotary", "tablet"] as const;
export type DegassingMethod = (typeof DEGASSING_METHODS)[number];

export const CHARGES = ["ingot", "clean-scrap", "mixed-scrap"] as const;
export type Charge = (typeof CHARGES)[number];

/** Where the metal enters the cavity: from below, at the side (parting line), or falling from the top. */
export const GATING_POSITIONS = ["bottom", "side", "top", "parting-line"] as const;
export type GatingPosition = (typeof GATING_POSITIONS)[number];

/** What holds the sand together: judged separately, because each wants its own water (docs/gating-and-copper-facts.md). */
export const SAND_TYPES = ["synthetic-bentonite", "natural-bonded", "oil-bonded", "chemically-bonded"] as const;
export type SandType = (typeof SAND_TYPES)[number];

/** A moulder's squeeze test when no instrument is at hand. */
export const SAND_FEELS = ["right", "too-dry", "too-wet"] as const;

export const MODIFIERS = ["none", "strontium", "sodium"] as const;
export const CRUCIBLES = ["clay-graphite", "silicon-carbide", "steel"] as const;
export const COATING_PERMEABILITIES = ["low", "medium", "high"] as const;
export const FOAM_TYPES = ["eps", "copolymer", "pmma"] as const;

export const DEFECT_TYPES = [
  "misrun",
  "cold-shut",
  "gas-porosity",
  "blowhole",
  "shrinkage",
  "rounded-edges",
  "dross-inclusion",
  "sand-inclusion",
  "hot-tear",
  "crack",
  "fold",
  "carbon-residue",
  "metal-penetration",
  "rough-surface",
  "sand-collapse",
  "swell",
  "warp",
  "flash",
  "blister",
  "pinholes",
  "sink",
  "scab",
  "rat-tail",
  "buckle",
  "erosion",
  "mismatch",
  "core-shift",
  "run-out",
  "leaker",
  "segregation",
  "zinc-loss",
] as const;
export type DefectType = (typeof DEFECT_TYPES)[number];

export const DEFECT_LOCATIONS = [
  "top",
  "bottom",
  "side",
  "corner",
  "edge",
  "thin-section",
  "thick-section",
  "near-gate",
  "far-from-gate",
  "junction",
  "parting-line",
  "around-core",
  "glue-line",
  "surface",
  "throughout",
] as const;
export type DefectLocation = (typeof DEFECT_LOCATIONS)[number];

const list = (values: readonly string[]) => values.join(", ");

export const defectSchema = z.object({
  type: z.enum(DEFECT_TYPES, { error: `type must be one of: ${list(DEFECT_TYPES)}` }),
  location: z
    .enum(DEFECT_LOCATIONS, { error: `location must be one of: ${list(DEFECT_LOCATIONS)}` })
    .default("throughout"),
  severity: z.number().int().min(1, "severity is 1 to 3").max(3, "severity is 1 to 3").default(2),
});
export type Defect = z.infer<typeof defectSchema>;

/** Up to 1,700 °C: iron pours at 1,300-1,450 °C (docs/gating-and-copper-facts.md "Iron"). */
const temperatureC = z.number().min(-60, "below -60 °C").max(1700, "above 1,700 °C");
const oneOf = <T extends readonly [string, ...string[]]>(name: string, values: T) =>
  z.enum(values, { error: `${name} must be one of: ${list(values)}` });
const positiveMm = z.number().positive("must be above 0 mm").max(5000, "above 5 m");

/** The alloy is checked against the alloy table by the caller (the table may hold shop alloys). */
export const caseSchema = z
  .object({
    defects: z.array(defectSchema).min(1, "mark at least one defect").max(50),
    // PostgreSQL text holds no NUL (the alloy is looked up in the table).
    alloy: z
      .string()
      .trim()
      .min(1, "alloy is required")
      .max(40)
      .refine((s) => !s.includes("\u0000"), "no NUL"),
    process: z.enum(PROCESSES, { error: `process must be one of: ${list(PROCESSES)}` }),
    pourTempC: temperatureC.optional(),
    meltTempC: temperatureC.optional(),
    degassing: z.enum(DEGASSING_METHODS, { error: `degassing must be one of: ${list(DEGASSING_METHODS)}` }).optional(),
    degasMinutes: z.number().min(0, "cannot be negative").max(240).optional(),
    degasToPourMin: z.number().min(0, "cannot be negative").max(1440).optional(),
    densityIndexPct: z.number().min(0, "0 to 100 %").max(100, "0 to 100 %").optional(),
    grainRefined: z.boolean().optional(),
    modifier: oneOf("modifier", MODIFIERS).optional(),
    crucible: oneOf("crucible", CRUCIBLES).optional(),
    /** Iron: melt analysis, inoculation, and minutes from inoculation or magnesium treatment to the pour. */
    meltCarbonPct: z.number().min(0).max(6, "0 to 6 %").optional(),
    meltSiliconPct: z.number().min(0).max(6, "0 to 6 %").optional(),
    inoculated: z.boolean().optional(),
    treatmentToPourMin: z.number().min(0, "cannot be negative").max(240).optional(),
    /** Copper-base: phosphor copper (or another deoxidiser) added just before the pour. */
    deoxidised: z.boolean().optional(),
    fluxed: z.boolean().optional(),
    skimmed: z.boolean().optional(),
    charge: z.enum(CHARGES, { error: `charge must be one of: ${list(CHARGES)}` }).optional(),
    ambientTempC: z.number().min(-40).max(60).optional(),
    humidityPct: z.number().min(0, "0 to 100 %").max(100, "0 to 100 %").optional(),
    sandMoisturePct: z.number().min(0, "0 to 100 %").max(100, "0 to 100 %").optional(),
    sandType: oneOf("sandType", SAND_TYPES).optional(),
    sandCompactabilityPct: z.number().min(0, "0 to 100 %").max(100, "0 to 100 %").optional(),
    greenStrengthKPa: z.number().positive("must be above 0 kPa").max(1000).optional(),
    sandFeel: oneOf("sandFeel", SAND_FEELS).optional(),
    mouldTempC: temperatureC.optional(),
    /** Plaster or investment mould dried and baked through before the pour; sand moulds and cores dried. */
    mouldDried: z.boolean().optional(),
    coating: z
      .object({
        applied: z.boolean().optional(),
        dried: z.boolean().optional(),
        coats: z.number().int().min(0).max(20).optional(),
        permeability: oneOf("coating permeability", COATING_PERMEABILITIES).optional(),
      })
      .optional(),
    foamDensityKgM3: z.number().positive().max(200).optional(),
    foamType: oneOf("foamType", FOAM_TYPES).optional(),
    glueJoints: z.boolean().optional(),
    /** Lost foam: the flask filled in layers and each vibrated, so the sand packs round the coated pattern. */
    sandVibrated: z.boolean().optional(),
    minSectionMm: positiveMm.optional(),
    maxSectionMm: positiveMm.optional(),
    sprueHeightMm: positiveMm.optional(),
    /** Sprue-base (choke) area and total ingate area, mm²; or a gating ratio sprue:runner:ingate. */
    chokeAreaMm2: z.number().positive("must be above 0 mm²").max(1e6).optional(),
    ingateAreaMm2: z.number().positive("must be above 0 mm²").max(1e6).optional(),
    gatingRatio: z
      .string()
      .trim()
      .regex(/^\d+(\.\d+)?\s*[:/-]\s*\d+(\.\d+)?\s*[:/-]\s*\d+(\.\d+)?$/, 'a ratio such as "1:2:4"')
      .optional(),
    gating: oneOf("gating", GATING_POSITIONS).optional(),
    hasFilter: z.boolean().optional(),
    pourTimeS: z.number().positive("must be above 0 s").max(3600).optional(),
    hasRiser: z.boolean().optional(),
    hasOverflow: z.boolean().optional(),
    hasVents: z.boolean().optional(),
  })
  .superRefine((c, ctx) => {
    if (c.minSectionMm !== undefined && c.maxSectionMm !== undefined && c.minSectionMm > c.maxSectionMm) {
      ctx.addIssue({
        code: "custom",
        path: ["minSectionMm"],
        message: "thinnest section is thicker than the thickest",
      });
    }
  });
export type DiagnosisCase = z.infer<typeof caseSchema>;
