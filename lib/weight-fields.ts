import { z } from "zod";

/**
 * The weights a caster puts on the scale: the charge going into the furnace, and for each mould the
 * casting as cleaned and all the metal poured into it (casting, sprue, runners, risers). They give the
 * yield (rules/compute/casting-yield.ts), which is the shop's own figure and no input of the diagnosis:
 * a low yield is heavy gating, not a defect. Kept apart from the rest of the schemas so the two blocks
 * below are all the notebook schemas take from here. Kilograms, as every mass the API keeps.
 */
/** 10 t is far beyond a small shop's crucible or a school lab's largest mould; a typo of ten times shows. */
const massKg = z.number().positive("must be above {0 kg}").max(10_000, "above {10000 kg}");

/** Checks only: the columns are nullable, so lib/table-schemas.ts lets each be absent or null. */
export const meltWeightChecks = { chargeWeightKg: massKg };
export const castingWeightChecks = { castingWeightKg: massKg, pouredWeightKg: massKg };

export const CASTING_HEAVIER_THAN_POUR =
  "the casting weighs more than the metal poured into its mould: the poured weight is the casting with its sprue, runners and risers, so it is the larger of the two";

/** The cleaned casting is part of what was poured, never more. */
export function castingWeightConflicts(c: { castingWeightKg?: number | null; pouredWeightKg?: number | null }) {
  const out: Record<string, string> = {};
  if (typeof c.castingWeightKg === "number" && typeof c.pouredWeightKg === "number")
    if (c.castingWeightKg > c.pouredWeightKg) out.castingWeightKg = CASTING_HEAVIER_THAN_POUR;
  return out;
}
