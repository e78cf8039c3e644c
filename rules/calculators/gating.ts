import { GATING_POSITIONS } from "../case";
import { velocityGuideMS } from "../compute/filling";
import {
  DEFAULT_DISCHARGE_COEFFICIENT,
  fillTimeS,
  flowRateM3PerS,
  ingateAreaForVelocityM2,
  ingateAreaFromRatioM2,
  ingateVelocityMPerS,
  isPressurised,
  parseGatingRatio,
  runnerVelocityMPerS,
  sprueBaseVelocityMPerS,
} from "../compute/gating";
import { CalcInputError, type CalcLine, type CalcResult, type CalcValue } from "./result";

/** Ratios sprue : runner : ingate a caster meets most: three that slow the metal, three that do not. */
export const GATING_RATIOS = ["1:2:4", "1:2:2", "1:4:4", "1:1:1", "1:2:1", "3:2:1"] as const;
export const INGATE_FROM = ["ratio", "area"] as const;

export type GatingInput = {
  /** From the metal level in the pouring cup to the sprue base. */
  sprueHeightMm: number;
  /** The sprue base (the choke of an unpressurised system). */
  chokeAreaCm2: number;
  ingateFrom: (typeof INGATE_FROM)[number];
  gatingRatio?: string;
  /** All ingates together. */
  ingateAreaCm2?: number;
  castingVolumeCm3?: number;
  minSectionMm?: number;
  /** The same positions a casting logs (rules/case.ts). */
  position: (typeof GATING_POSITIONS)[number];
};

const SOURCE =
  "rules/compute/gating.ts; docs/gating-and-copper-facts.md 'Filling': continuity, Campbell's rule 2 [hb], Cd [mem]";

/**
 * The gating's speeds against the critical ingate velocity, the pour time, and the ingate area that would
 * bring the metal under it. The same functions the diagnosis uses (rules/compute/gating.ts).
 */
export function gating(input: GatingInput): CalcResult {
  const heightM = input.sprueHeightMm / 1000;
  const baseM2 = input.chokeAreaCm2 / 1e4;
  const ratio = input.ingateFrom === "ratio" ? parseGatingRatio(input.gatingRatio ?? "") : undefined;
  if (input.ingateFrom === "ratio" && !ratio)
    throw new CalcInputError("gatingRatio", "choose a ratio sprue : runner : ingate");
  if (input.ingateFrom === "area" && input.ingateAreaCm2 === undefined)
    throw new CalcInputError("ingateAreaCm2", "give the area of all ingates together");
  const ingateM2 = ratio ? ingateAreaFromRatioM2(baseM2, ratio) : input.ingateAreaCm2! / 1e4;

  const vBase = sprueBaseVelocityMPerS(heightM);
  const flow = flowRateM3PerS(vBase, baseM2);
  const vIngate = ingateVelocityMPerS({
    sprueBaseVelocityMPerS: vBase,
    sprueBaseAreaM2: baseM2,
    ingateAreaM2: ingateM2,
  });
  const guide = velocityGuideMS(input.minSectionMm);
  const areaForGuideM2 = ingateAreaForVelocityM2(flow, guide);

  const inputs: CalcValue[] = [
    { label: "Sprue height, cup level to sprue base", quantity: "length", si: input.sprueHeightMm },
    { label: "Sprue-base (choke) area", quantity: "area-cm2", si: input.chokeAreaCm2 },
  ];
  if (ratio)
    inputs.push({ label: `Ingates by the ratio ${input.gatingRatio}`, quantity: "area-cm2", si: ingateM2 * 1e4 });
  else inputs.push({ label: "Ingate area, all together", quantity: "area-cm2", si: input.ingateAreaCm2! });
  if (input.minSectionMm !== undefined)
    inputs.push({ label: "Thinnest section", quantity: "length", si: input.minSectionMm });
  if (input.castingVolumeCm3 !== undefined)
    inputs.push({ label: "Casting volume with risers", quantity: "volume-cm3", si: input.castingVolumeCm3 });

  const lines: CalcLine[] = [
    {
      label: "Sprue-base velocity",
      quantity: "velocity",
      si: vBase,
      formula: `v = Cd · √(2 g h), Cd = ${DEFAULT_DISCHARGE_COEFFICIENT}`,
      source: SOURCE,
    },
    { label: "Flow", quantity: "flow-cm3-per-s", si: flow * 1e6, formula: "Q = v · A_sprue base", source: SOURCE },
  ];
  if (ratio)
    lines.push({
      label: "Runner velocity",
      quantity: "velocity",
      si: runnerVelocityMPerS(vBase, ratio),
      formula: "v_runner = v · A_sprue base / A_runner (at most v)",
      source: SOURCE,
    });
  lines.push(
    {
      label: "Ingate velocity",
      quantity: "velocity",
      si: vIngate,
      formula: "v_ingate = Q / A_ingates (at most v)",
      source: SOURCE,
    },
    {
      label: "Critical ingate velocity for this section",
      quantity: "velocity",
      si: guide,
      formula: "0.5 m/s; about 1 m/s in walls of 5 mm or less",
      source: "rules/compute/filling.ts; Campbell's rule 2 [hb]",
    },
    {
      label: "Ingate area for the critical velocity",
      quantity: "area-cm2",
      si: areaForGuideM2 * 1e4,
      formula: "A_ingates = Q / v_critical",
      source: SOURCE,
    },
  );
  if (input.castingVolumeCm3 !== undefined)
    lines.push({
      label: "Pour time at this flow",
      quantity: "time-s",
      si: fillTimeS(input.castingVolumeCm3 / 1e6, flow),
      formula: "t = V / Q",
      source: SOURCE,
    });

  const times = vIngate / guide;
  const over = times > 1;
  const notes = [
    `Ingates ${round(ingateM2 / baseM2)} × the sprue base: ${
      ratio && isPressurised(ratio)
        ? "a pressurised system runs full but jets through the ingates at about sprue-base speed."
        : ingateM2 <= baseM2
          ? "the ingates are the choke, so the metal leaves them at about sprue-base speed."
          : "the choke is at the sprue base and the larger ingates slow the metal."
    }`,
    "Not for lost foam: there the foam's decomposition paces the front, not the sprue.",
  ];
  if (input.position === "top")
    notes.push(
      "With top gating the metal falls inside the cavity after the ingate, so it lands faster than the ingate velocity.",
    );
  else
    notes.push("The slowing holds only if runner and ingates run full, as they do when gated at the bottom or side.");
  const warnings = over
    ? [
        `Metal enters at ${round(vIngate)} m/s, ${round(times)} × the critical velocity: widen the ingates to about ${round(
          areaForGuideM2 * 1e4,
        )} cm² together (1 : ${round(areaForGuideM2 / baseM2)} of the sprue base), or lower the sprue.`,
      ]
    : [];
  return {
    summary: `Ingates ${round(vIngate)} m/s, ${over ? "over" : "within"} the ${guide} m/s critical velocity`,
    inputs,
    lines,
    notes,
    warnings,
  };
}

const round = (x: number) => Number(x.toPrecision(2));
