import type { Process } from "../case";
import { meltTempForPourC } from "../compute/calculators";
import { pourWindowC, pourWindowPosition } from "../compute/pour-window";
import { superheatC } from "../compute/temperature";
import { CalcInputError, type CalcAlloy, type CalcResult } from "./result";

export type PourTemperatureInput = {
  alloy: string;
  process: Process;
  minSectionMm?: number;
  /** The temperature the caster means to pour at; the window's middle when not given. */
  plannedPourC?: number;
  /** Degrees the metal loses between furnace and mould (tapping, carrying, skimming); the shop's own figure. */
  transferLossC: number;
};

/** The window to aim for, the superheat it gives, where a planned temperature falls, the melt to reach. */
export function pourTemperature(input: PourTemperatureInput, alloy: CalcAlloy): CalcResult {
  if (input.plannedPourC !== undefined && input.plannedPourC <= alloy.solidusC)
    throw new CalcInputError(
      "plannedPourC",
      `${alloy.designation} is solid at or below ${alloy.solidusC} °C (its solidus): metal cannot be poured there`,
    );
  const window = pourWindowC({
    family: alloy.family,
    process: input.process,
    liquidusC: alloy.liquidusC,
    minSectionMm: input.minSectionMm,
  });
  const aimC = input.plannedPourC ?? (window.lowC + window.highC) / 2;
  const meltC = meltTempForPourC(aimC, input.transferLossC);
  const place = pourWindowPosition(aimC, window);
  const windowSource = `rules/compute/pour-window.ts: ${window.source}`;
  const superheatSource = "superheat = pour − liquidus (definition); liquidus from the shop's alloy table";
  const notes: string[] = [];
  const warnings: string[] = [];
  if (input.plannedPourC === undefined) notes.push("No planned temperature given: the window's middle is used.");
  else if (place.position === "inside") notes.push("The planned temperature is inside the window.");
  else if (place.position === "below")
    warnings.push(
      `The planned temperature is ${place.belowWindowC} °C below the window: a misrun or cold shut is more likely.`,
    );
  else
    warnings.push(
      `The planned temperature is ${place.aboveWindowC} °C above the window: more gas, more oxide and more shrinkage.`,
    );
  if (aimC < alloy.liquidusC)
    warnings.push(`Below the liquidus (${alloy.liquidusC} °C): the metal is already part solid when poured.`);
  return {
    summary: `Pour ${Math.round(window.lowC)}-${Math.round(window.highC)} °C; reach ${Math.round(meltC)} °C in the furnace`,
    inputs: [
      { label: "Liquidus", quantity: "temperature", si: alloy.liquidusC },
      { label: "Solidus", quantity: "temperature", si: alloy.solidusC },
      ...(input.minSectionMm !== undefined
        ? [{ label: "Thinnest section", quantity: "length" as const, si: input.minSectionMm }]
        : []),
      ...(input.plannedPourC !== undefined
        ? [{ label: "Planned pour", quantity: "temperature" as const, si: input.plannedPourC }]
        : []),
      { label: "Transfer loss", quantity: "temperature-difference", si: input.transferLossC },
    ],
    lines: [
      {
        label: "Window, low end",
        quantity: "temperature",
        si: window.lowC,
        formula: "by alloy and process",
        source: windowSource,
      },
      {
        label: "Window, high end",
        quantity: "temperature",
        si: window.highC,
        formula: "by alloy and process",
        source: windowSource,
      },
      {
        label: input.plannedPourC === undefined ? "Superheat at the window's middle" : "Superheat of the planned pour",
        quantity: "temperature-difference",
        si: superheatC(aimC, alloy.liquidusC),
        formula: "ΔT = T_pour − T_liquidus",
        source: superheatSource,
      },
      {
        label: "Melt temperature to reach",
        quantity: "temperature",
        si: meltC,
        formula: "T_melt = T_pour + transfer loss",
        source: 'docs/calculator-facts.md "Metal" [calc]; the transfer loss is the shop\'s own figure',
      },
    ],
    notes,
    warnings,
  };
}
