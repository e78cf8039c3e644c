import { BUILT_IN_ALLOYS, type AlloySpec } from "./alloys";
import type { DiagnosisCase } from "./case";
import type { AlloyFamily } from "./fact-catalog";

/**
 * An alloy the table does not hold is diagnosed by its family. The family comes from the designation
 * where its numbering tells it (Aluminum Association casting numbers: 2xx.x Al-Cu, 3xx.x Al-Si-Cu/Mg,
 * 4xx.x Al-Si, 5xx.x Al-Mg, 7xx.x Al-Zn; four digits wrought; UNS C8xxxx/C9xxxx cast copper), else from
 * the temperatures logged (unknown scrap poured near 700 °C is aluminium, near 1,100 °C copper-base,
 * above 1,300 °C iron: common practice). Figures are a typical alloy of that family.
 */
const TYPICAL: Record<string, string> = {
  "al-cu": "206.0",
  "al-si-cu": "319.0",
  "al-si": "A356.0",
  "al-mg": "514.0",
  "al-zn": "713.0",
  "al-wrought": "6061",
  "red-brass": "C83600",
  "yellow-brass": "C85700",
  "manganese-bronze": "C86500",
  "silicon-bronze": "C87300",
  "tin-bronze": "C90500",
  "aluminium-bronze": "C95400",
  "gray-iron": "gray-iron",
  "ductile-iron": "ductile-iron",
};

function familyFromDesignation(d: string): AlloyFamily | undefined {
  const x = d.trim().toUpperCase().replace(/\s+/g, "");
  const aa = /^[A-Z]?([1-9])\d\d(\.\d)?$/.exec(x);
  if (aa) return ({ "2": "al-cu", "3": "al-si-cu", "4": "al-si", "5": "al-mg", "7": "al-zn" } as const)[aa[1]];
  if (/^[1-8]\d{3}$/.test(x)) return "al-wrought";
  const cu = /^C(8[0-9]|9[0-9])\d{3}$/.exec(x);
  if (cu) {
    const n = Number(cu[1]);
    if (n <= 84) return "red-brass";
    if (n === 85) return "yellow-brass";
    if (n === 86) return "manganese-bronze";
    if (n === 87) return "silicon-bronze";
    if (n >= 90 && n <= 94) return "tin-bronze";
    if (n === 95) return "aluminium-bronze";
    return "copper-base";
  }
  if (/DUCTILE|NODULAR|SG-?IRON|GJS/.test(x)) return "ductile-iron";
  if (/IRON|GJL/.test(x)) return "gray-iron";
  if (/BRASS|BRONZE|COPPER/.test(x)) return "copper-base";
  if (/ALUMIN/.test(x)) return "al-wrought";
  return undefined;
}

function familyFromTemperature(c: DiagnosisCase): AlloyFamily {
  const t = c.meltTempC ?? c.pourTempC;
  if (t !== undefined && t >= 1300) return "gray-iron";
  if (t !== undefined && t >= 900) return "copper-base";
  return "al-wrought";
}

export function alloyByFamilyGuess(c: DiagnosisCase): { alloy: AlloySpec; note: string } {
  const byName = familyFromDesignation(c.alloy);
  const family = byName ?? familyFromTemperature(c);
  const typical = TYPICAL[family];
  const base: AlloySpec = typical
    ? BUILT_IN_ALLOYS.find((a) => a.designation === typical)!
    : { ...BUILT_IN_ALLOYS.find((a) => a.designation === "C83600")!, pourLightC: undefined, pourHeavyC: undefined };
  const alloy: AlloySpec = { ...base, designation: c.alloy, family, aliases: undefined };
  const how = byName
    ? `its designation places it in the ${family} family`
    : c.meltTempC !== undefined || c.pourTempC !== undefined
      ? `the temperatures logged place it in the ${family} family`
      : `nothing logged tells its family, so it is taken as wrought aluminium scrap`;
  return {
    alloy,
    note: `"${c.alloy}" is not in the alloy table: ${how}, and it is diagnosed with the figures of ${typical ?? "a typical copper alloy"} (liquidus ${alloy.liquidusC} °C). Add the alloy to the shop's table for a sharper answer.`,
  };
}
