import { castingConditionChecks, meltConditionChecks } from "../../lib/condition-fields";
import type { Mark, Melt } from "../../lib/notebook-schemas";
import { caseSchema, type DiagnosisCase } from "../../rules/case";
import type { CastingRow } from "../castings/lookup";
import { fieldErrors, HttpError } from "../http/errors";
import { withoutNulls } from "../notebook/shared";

/**
 * A stored casting as the diagnosis contract reads it (DESIGN.md "The diagnosis contract"): the melt's
 * pour conditions, the casting's geometry and gating, its marks as defects. Nothing logged stays absent.
 */
const pick = (o: Record<string, unknown>, keys: string[]) =>
  Object.fromEntries(keys.filter((k) => o[k] !== undefined).map((k) => [k, o[k]]));

export function caseFromCasting(casting: CastingRow, melt: Melt, marks: Mark[]): DiagnosisCase {
  if (!marks.length) {
    throw new HttpError(400, "Mark at least one defect first.", { marks: "mark at least one defect first" });
  }
  const m = withoutNulls(melt);
  const c = withoutNulls(casting);
  const coating = withoutNulls({
    applied: melt.coatingApplied,
    dried: melt.coatingDried,
    coats: melt.coatingCoats,
    permeability: melt.coatingPermeability,
  });
  // The conditions beyond the everyday ones go over one to one (lib/condition-fields.ts), except the
  // coating's permeability, which the contract keeps with the rest of the coating.
  const meltConditions = pick(
    m,
    Object.keys(meltConditionChecks).filter((k) => k !== "coatingPermeability"),
  );
  const castingConditions = pick(c, Object.keys(castingConditionChecks));
  const raw = {
    defects: marks.map((mk) => ({ type: mk.type, location: mk.location, severity: mk.severity })),
    alloy: melt.alloy,
    process: melt.process,
    pourTempC: m.pourTempC,
    meltTempC: m.meltTempC,
    degassing: m.degassing,
    degasMinutes: m.degasMinutes,
    fluxed: m.fluxed,
    skimmed: m.skimmed,
    charge: m.charge,
    ambientTempC: m.ambientTempC,
    humidityPct: m.humidityPct,
    sandMoisturePct: m.sandMoisturePct,
    coating: Object.keys(coating).length ? coating : undefined,
    foamDensityKgM3: m.foamDensityKgM3,
    ...meltConditions,
    minSectionMm: c.minSectionMm,
    maxSectionMm: c.maxSectionMm,
    sprueHeightMm: c.sprueHeightMm,
    pourTimeS: c.pourTimeS,
    hasRiser: c.hasRiser,
    hasOverflow: c.hasOverflow,
    hasVents: c.hasVents,
    ...castingConditions,
  };
  const parsed = caseSchema.safeParse(raw);
  if (!parsed.success) {
    // The notebook's own checks are at least as strict, so this means a stored value predates them.
    throw new HttpError(
      400,
      "This casting holds values the diagnosis cannot read; correct them first.",
      fieldErrors(parsed.error),
    );
  }
  return parsed.data;
}
