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
] as const;
export type DefectType = (typeof DEFECT_TYPES)[number];

export const DEFECT_LOCATIONS = [
  "top",
  "bottom",
  "side",
  "corner",
  "thin-section",
  "thick-section",
  "near-gate",
  "far-from-gate",
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

const temperatureC = z.number().min(-60, "below -60 °C").max(1400, "above 1,400 °C");
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
    fluxed: z.boolean().optional(),
    skimmed: z.boolean().optional(),
    charge: z.enum(CHARGES, { error: `charge must be one of: ${list(CHARGES)}` }).optional(),
    ambientTempC: z.number().min(-40).max(60).optional(),
    humidityPct: z.number().min(0, "0 to 100 %").max(100, "0 to 100 %").optional(),
    sandMoisturePct: z.number().min(0, "0 to 100 %").max(100, "0 to 100 %").optional(),
    coating: z
      .object({
        applied: z.boolean().optional(),
        dried: z.boolean().optional(),
        coats: z.number().int().min(0).max(20).optional(),
      })
      .optional(),
    foamDensityKgM3: z.number().positive().max(200).optional(),
    minSectionMm: positiveMm.optional(),
    maxSectionMm: positiveMm.optional(),
    sprueHeightMm: positiveMm.optional(),
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
