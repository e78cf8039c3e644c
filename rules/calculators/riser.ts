import { riserDiameterForModulusCm } from "../compute/calculators";
import {
  boxModulusCm,
  chvorinovTimeMin,
  cylinderSectionModulusCm,
  minRiserModulusCm,
  modulusCm,
  NECK_MODULUS_FACTOR,
  neckDiameterCm,
  plateFeedingDistanceMm,
  RISER_MODULUS_FACTOR,
} from "../compute/solidification";
import { CalcInputError, type CalcLine, type CalcResult, type CalcValue } from "./result";

export const RISER_SHAPES = ["plate", "bar", "cylinder", "typed"] as const;
export type RiserShape = (typeof RISER_SHAPES)[number];

export type RiserInput = {
  /** plate and bar: L × W × T; cylinder: D × H; typed: V and A of any section. */
  shape: RiserShape;
  lengthMm?: number;
  widthMm?: number;
  thicknessMm?: number;
  diameterMm?: number;
  heightMm?: number;
  volumeCm3?: number;
  areaCm2?: number;
  /** Chvorinov's mould constant C_m for the shop's sand and metal, min/cm²; freezing times need it. */
  mouldConstantMinPerCm2?: number;
};

const SOURCE = "rules/compute/solidification.ts; Chvorinov's rule [hb] Groover, Fundamentals of Modern Manufacturing";

function sectionModulusCm(input: RiserInput): { mCm: number; inputs: CalcValue[]; formula: string } {
  const need = (field: keyof RiserInput) => {
    const v = input[field];
    if (typeof v !== "number") throw new CalcInputError(field, "needed for this shape");
    return v;
  };
  const len = (label: string, field: keyof RiserInput): [number, CalcValue] => {
    const mm = need(field);
    return [mm / 10, { label, quantity: "length", si: mm }];
  };
  if (input.shape === "cylinder") {
    const [d, dv] = len("Diameter", "diameterMm");
    const [h, hv] = len("Height", "heightMm");
    return { mCm: cylinderSectionModulusCm(d, h), inputs: [dv, hv], formula: "M = (π D² H / 4) / (π D H + π D² / 2)" };
  }
  if (input.shape === "typed") {
    const v = need("volumeCm3");
    const a = need("areaCm2");
    return {
      mCm: modulusCm(v, a),
      inputs: [
        { label: "Volume", quantity: "volume-cm3", si: v },
        { label: "Cooling area", quantity: "area-cm2", si: a },
      ],
      formula: "M = V / A",
    };
  }
  const [l, lv] = len("Length", "lengthMm");
  const [w, wv] = len("Width", "widthMm");
  const [t, tv] = len("Thickness", "thicknessMm");
  return { mCm: boxModulusCm(l, w, t), inputs: [lv, wv, tv], formula: "M = L W T / 2 (L W + L T + W T)" };
}

/** A section's modulus and freezing time, a riser that freezes after it, its neck, and how far it feeds. */
export function riser(input: RiserInput): CalcResult {
  const { mCm, inputs, formula } = sectionModulusCm(input);
  const riserMCm = minRiserModulusCm(mCm);
  const riserDCm = riserDiameterForModulusCm(mCm);
  const cm = input.mouldConstantMinPerCm2;
  const lines: CalcLine[] = [
    { label: "Casting modulus", quantity: "length", si: mCm * 10, formula, source: SOURCE },
    {
      label: `Riser modulus (factor ${RISER_MODULUS_FACTOR})`,
      quantity: "length",
      si: riserMCm * 10,
      formula: `M_riser = ${RISER_MODULUS_FACTOR} · M_casting`,
      source: "rules/compute/solidification.ts; modulus factor 1.2, rule of thumb [mem]",
    },
    {
      label: "Riser diameter = height",
      quantity: "length",
      si: riserDCm * 10,
      formula: "cylinder H = D: M = D / 6, so D = 6 · M_riser",
      source: "rules/compute/calculators.ts; geometry",
    },
    {
      label: `Neck diameter (factor ${NECK_MODULUS_FACTOR})`,
      quantity: "length",
      si: neckDiameterCm(mCm) * 10,
      formula: `short round neck: M = d / 4, d = 4 · ${NECK_MODULUS_FACTOR} · M_casting`,
      source: "rules/compute/solidification.ts; moduli 1 : 1.1 : 1.2, rule of thumb [mem]",
    },
  ];
  if (cm !== undefined) {
    lines.push(
      {
        label: "Casting freezes in",
        quantity: "time-min",
        si: chvorinovTimeMin(mCm, cm),
        formula: "t = C_m · M²",
        source: SOURCE,
      },
      {
        label: "Riser freezes in",
        quantity: "time-min",
        si: chvorinovTimeMin(riserMCm, cm),
        formula: "t = C_m · M_riser²",
        source: SOURCE,
      },
    );
  }
  const notes = cm === undefined ? ["Give the mould constant C_m to see freezing times."] : [];
  if (input.shape === "plate" && input.thicknessMm !== undefined) {
    const feed = plateFeedingDistanceMm(input.thicknessMm);
    lines.push({
      label: "Feeding distance with a free edge beyond",
      quantity: "length",
      si: feed.withEndZoneMm,
      formula: "about 2 T riser zone + 2.5 T end zone = 4.5 T",
      source: "rules/compute/solidification.ts; from steel plates, rule of thumb [mem]",
    });
    notes.push("The feeding distance comes from steel plates: for aluminium and copper alloys it is a first guess.");
  }
  return {
    summary: `Modulus ${(mCm * 10).toFixed(1)} mm; riser D = H = ${(riserDCm * 10).toFixed(0)} mm`,
    inputs: [
      ...inputs,
      ...(cm !== undefined ? [{ label: "Mould constant C_m", quantity: "min-per-cm2" as const, si: cm }] : []),
    ],
    lines,
    notes,
    warnings: [],
  };
}
