import { metalOf, type AlloySpec } from "../alloys";

/**
 * What every calculator hands back: its inputs and results as SI values with the quantity they are,
 * so the app can say them in a person's units, each result with its formula and source.
 */
export type CalcQuantity =
  | "temperature"
  | "temperature-difference"
  | "length"
  | "mass"
  | "density"
  | "volume-cm3"
  | "area-cm2"
  | "time-min"
  | "time-s"
  | "velocity"
  | "flow-cm3-per-s"
  | "percent"
  | "solubility-cm3-per-100g"
  | "pressure-kpa"
  | "in-per-ft"
  | "min-per-cm2";

export type CalcValue = { label: string; quantity: CalcQuantity; si: number };
export type CalcLine = CalcValue & { formula: string; source: string };
export type CalcResult = {
  /** The headline, in words, for a saved result's one-line summary. */
  summary: string;
  inputs: CalcValue[];
  lines: CalcLine[];
  /** Plain statements about the result (where a planned temperature falls, what a figure means). */
  notes: string[];
  /** Something to act on before the pour (a crucible too small, a temperature out of the window). */
  warnings: string[];
};

/** The alloy's figures a calculator needs (a row of the shop's alloy table). */
export type CalcAlloy = Pick<
  AlloySpec,
  "designation" | "family" | "solidusC" | "liquidusC" | "densityKgM3" | "shrinkAllowancePct"
> & { siliconPct?: number | null };

/** An input that cannot be (a riser of negative volume, a pour below the solidus): which field and why. */
export class CalcInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

/** Hydrogen solubility and degassing apply to aluminium only (rules/alloys.ts names the metal of a family). */
export const isAluminium = (alloy: CalcAlloy) => metalOf(alloy.family) === "aluminium";
