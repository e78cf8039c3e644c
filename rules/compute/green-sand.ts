import type { Process, SandType } from "../case";

/**
 * Judging green sand. A fixed moisture per cent misleads: the water a sand needs depends on its active
 * clay, fines and additives, and shops control it by compactability or temper ([web] Simpson
 * Technologies, "Classifying Water in Green Sand" (2024)). Figures: docs/gating-and-copper-facts.md
 * "Green sand".
 */
export type Temper = "dry" | "right" | "wet";

/** Usual water by sand type, % [mem]: synthetic bentonite about 2.5-4.5, natural-bonded about 5-8. */
export const MOISTURE_BAND_PCT: Record<SandType, readonly [number, number]> = {
  "synthetic-bentonite": [2.5, 4.5],
  "natural-bonded": [5, 8],
  // Oil-bonded sand carries no water ([web] Petro Bond brochure); chemically bonded sand is dry (common practice).
  "oil-bonded": [0, 0.5],
  "chemically-bonded": [0, 1],
};
/** Without the sand type only the extremes can be called (common practice): drier or wetter than any clay sand. */
export const UNKNOWN_SAND_BAND_PCT: readonly [number, number] = [2, 8];

/** Compactability typically 35-50 %; lower is dry and friable, higher is over-wet ([web] Simpson, "Using the Compactability Test"). */
export const COMPACTABILITY_BAND_PCT: readonly [number, number] = [35, 50];

/** Green compression strength under about 50 kPa (7 psi) is weak sand [mem]; 70-140 kPa is usual [mem]. */
export const WEAK_GREEN_STRENGTH_KPA = 50;

export function moistureAgainstSand(moisturePct: number, sandType?: SandType): Temper | undefined {
  const [low, high] = sandType ? MOISTURE_BAND_PCT[sandType] : UNKNOWN_SAND_BAND_PCT;
  if (moisturePct > high) return "wet";
  // Oil and chemically bonded sands are not "too dry" for lack of water.
  if (moisturePct < low) return "dry";
  return sandType ? "right" : undefined;
}

export function compactabilityTemper(compactabilityPct: number): Temper {
  const [low, high] = COMPACTABILITY_BAND_PCT;
  return compactabilityPct < low ? "dry" : compactabilityPct > high ? "wet" : "right";
}

/**
 * The temper of a clay-bonded green sand: compactability when measured (what shops control by), else
 * the moulder's squeeze test, else water against the sand type. Undefined when nothing decides it or the
 * mould is not clay-and-water green sand (oil-bonded sand has no temper water).
 */
export function sandTemper(s: {
  process: Process;
  sandType?: SandType;
  moisturePct?: number;
  compactabilityPct?: number;
  feel?: "right" | "too-dry" | "too-wet";
}): Temper | undefined {
  if (s.process !== "green-sand") return undefined;
  if (s.sandType === "oil-bonded" || s.sandType === "chemically-bonded") return undefined;
  if (s.compactabilityPct !== undefined) return compactabilityTemper(s.compactabilityPct);
  if (s.feel !== undefined) return s.feel === "right" ? "right" : s.feel === "too-dry" ? "dry" : "wet";
  if (s.moisturePct !== undefined) return moistureAgainstSand(s.moisturePct, s.sandType);
  return undefined;
}

/** What sandTemper went by, for the reason shown to the caster. */
export function temperBasis(s: Parameters<typeof sandTemper>[0]) {
  if (sandTemper(s) === undefined) return undefined;
  if (s.compactabilityPct !== undefined) return "compactability" as const;
  if (s.feel !== undefined) return "feel" as const;
  return s.sandType ? ("water-for-the-sand-type" as const) : ("water" as const);
}
