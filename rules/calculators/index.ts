import { gating, type GatingInput } from "./gating";
import { hydrogen, type HydrogenInput } from "./hydrogen";
import { metalToMelt, type MetalInput } from "./metal";
import { patternSize, type PatternInput } from "./pattern";
import { pourTemperature, type PourTemperatureInput } from "./pour-temperature";
import type { CalcAlloy, CalcResult } from "./result";
import { riser, type RiserInput } from "./riser";

/** The calculators, by the name that appears in their URL and in a saved result. */
export const CALCULATORS = ["pour-temperature", "metal", "pattern", "riser", "gating", "hydrogen"] as const;
export type CalculatorKind = (typeof CALCULATORS)[number];
export type CalculatorInputs = {
  "pour-temperature": PourTemperatureInput;
  metal: MetalInput;
  pattern: PatternInput;
  riser: RiserInput;
  gating: GatingInput;
  hydrogen: HydrogenInput;
};

/** Calculators that need an alloy's figures; the riser works from shape alone, the gating from areas and heights. */
export const needsAlloy = (kind: CalculatorKind) => kind !== "riser" && kind !== "gating";

/** One way in for the app and the server, so a saved result is the one the screen showed. */
export function runCalculator<K extends CalculatorKind>(
  kind: K,
  input: CalculatorInputs[K],
  alloy: CalcAlloy | undefined,
): CalcResult {
  const a = () => {
    if (!alloy) throw new Error(`the ${kind} calculator needs an alloy`);
    return alloy;
  };
  switch (kind) {
    case "pour-temperature":
      return pourTemperature(input as PourTemperatureInput, a());
    case "metal":
      return metalToMelt(input as MetalInput, a());
    case "pattern":
      return patternSize(input as PatternInput, a());
    case "riser":
      return riser(input as RiserInput);
    case "gating":
      return gating(input as GatingInput);
    case "hydrogen":
      return hydrogen(input as HydrogenInput, a());
  }
  throw new Error(`unknown calculator ${String(kind)}`);
}

export * from "./result";
