import {
  CHARGES,
  COATING_PERMEABILITIES,
  CRUCIBLES,
  DEGASSING_METHODS,
  FOAM_TYPES,
  GATING_POSITIONS,
  MODIFIERS,
  PROCESSES,
  SAND_FEELS,
  SAND_TYPES,
} from "./case";

/**
 * Every fact a rule may read: the case's own inputs and the values derived from them
 * (rules/facts.ts computes those). The rule loader refuses a rule that names a fact not listed
 * here, and the rule form in the app builds its pickers from this list.
 *
 * `quantity` says how the value converts between a person's units (values are stored SI).
 */
export type FactQuantity =
  | "temperature" // °C
  | "temperature-difference" // K (°C difference)
  | "length" // mm
  | "velocity" // m/s
  | "time" // s
  | "minutes"
  | "percent"
  | "density" // kg/m³
  | "hydrogen" // cm³ H2 (STP) per 100 g
  | "pressure" // kPa
  | "area" // mm²
  | "ratio"
  | "count";

export type FactSpec =
  | { name: string; label: string; kind: "number"; quantity: FactQuantity; derived: boolean }
  | { name: string; label: string; kind: "boolean"; derived: boolean }
  | { name: string; label: string; kind: "enum"; values: readonly string[]; derived: boolean };

/**
 * Aluminium families by their main alloying element; copper-base families by melt practice (each has its
 * own: docs/gating-and-copper-facts.md "Copper-base melt practice"), "copper-base" for a copper alloy of
 * unknown kind; gray and ductile iron.
 */
export const ALLOY_FAMILIES = [
  "al-si",
  "al-si-cu",
  "al-cu",
  "al-mg",
  "al-zn",
  "al-wrought",
  "copper-base",
  "red-brass",
  "yellow-brass",
  "manganese-bronze",
  "tin-bronze",
  "silicon-bronze",
  "aluminium-bronze",
  "gray-iron",
  "ductile-iron",
] as const;
export type AlloyFamily = (typeof ALLOY_FAMILIES)[number];

export const METALS = ["aluminium", "copper", "iron"] as const;
export const TEMPERS = ["dry", "right", "wet"] as const;
export const TEMPER_BASES = ["compactability", "feel", "water-for-the-sand-type", "water"] as const;
export const MOISTURE_RISKS = ["low", "moderate", "high"] as const;
export const POUR_WINDOW_POSITIONS = ["below", "inside", "above"] as const;

const n = (name: string, label: string, quantity: FactQuantity, derived = false): FactSpec => ({
  name,
  label,
  kind: "number",
  quantity,
  derived,
});
const b = (name: string, label: string, derived = false): FactSpec => ({ name, label, kind: "boolean", derived });
const e = (name: string, label: string, values: readonly string[], derived = false): FactSpec => ({
  name,
  label,
  kind: "enum",
  values,
  derived,
});

export const FACTS: readonly FactSpec[] = [
  // Inputs, straight from the case (coating.* flattened).
  e("process", "process", PROCESSES),
  n("pourTempC", "pour temperature", "temperature"),
  n("meltTempC", "highest melt temperature", "temperature"),
  e("degassing", "degassing method", DEGASSING_METHODS),
  n("degasMinutes", "degassing time", "minutes"),
  n("degasToPourMin", "time from degassing to pouring", "minutes"),
  n("densityIndexPct", "density index (reduced-pressure test)", "percent"),
  b("grainRefined", "grain refiner added"),
  e("modifier", "modifier", MODIFIERS),
  e("crucible", "crucible", CRUCIBLES),
  n("meltCarbonPct", "carbon in the melt", "percent"),
  n("meltSiliconPct", "silicon in the melt", "percent"),
  b("inoculated", "iron inoculated"),
  n("treatmentToPourMin", "time from inoculation or magnesium treatment to pouring", "minutes"),
  b("deoxidised", "deoxidised before the pour (phosphor copper)"),
  b("fluxed", "flux used"),
  b("skimmed", "skimmed before pouring"),
  e("charge", "charge", CHARGES),
  n("ambientTempC", "ambient temperature", "temperature"),
  n("humidityPct", "relative humidity", "percent"),
  n("sandMoisturePct", "sand moisture", "percent"),
  e("sandType", "sand type", SAND_TYPES),
  n("sandCompactabilityPct", "sand compactability", "percent"),
  n("greenStrengthKPa", "green compression strength", "pressure"),
  e("sandFeel", "sand by feel", SAND_FEELS),
  n("mouldTempC", "mould, die or shell temperature at the pour", "temperature"),
  b("mouldDried", "mould dried and baked through"),
  b("coatingApplied", "coating applied"),
  b("coatingDried", "coating dried"),
  n("coatingCoats", "coats of coating", "count"),
  e("coatingPermeability", "coating permeability", COATING_PERMEABILITIES),
  n("foamDensityKgM3", "foam density", "density"),
  e("foamType", "foam type", FOAM_TYPES),
  b("glueJoints", "glued foam joints"),
  b("sandVibrated", "sand filled and vibrated in layers (lost foam)"),
  n("minSectionMm", "thinnest section", "length"),
  n("maxSectionMm", "thickest section", "length"),
  n("sprueHeightMm", "sprue height", "length"),
  n("chokeAreaMm2", "sprue-base (choke) area", "area"),
  n("ingateAreaMm2", "total ingate area", "area"),
  e("gating", "where the metal enters", GATING_POSITIONS),
  b("hasFilter", "filter in the running system"),
  n("pourTimeS", "pour time", "time"),
  b("hasRiser", "has a riser"),
  b("hasOverflow", "has an overflow"),
  b("hasVents", "has vents"),
  // Derived (rules/facts.ts).
  e("alloyFamily", "alloy family", ALLOY_FAMILIES, true),
  b("isAluminium", "aluminium alloy", true),
  e("metal", "metal", METALS, true),
  b("leadedAlloy", "leaded alloy", true),
  n("liquidusC", "liquidus", "temperature", true),
  n("solidusC", "solidus", "temperature", true),
  n("freezingRangeC", "freezing range", "temperature-difference", true),
  n("superheatC", "superheat at pouring", "temperature-difference", true),
  n("meltSuperheatC", "superheat of the melt at its hottest", "temperature-difference", true),
  n("pourWindowLowC", "lowest usual pour temperature", "temperature", true),
  n("pourWindowHighC", "highest usual pour temperature", "temperature", true),
  e("pourWindowPosition", "pour temperature against the usual window", POUR_WINDOW_POSITIONS, true),
  n("pourBelowWindowC", "degrees below the usual pour window", "temperature-difference", true),
  n("pourAboveWindowC", "degrees above the usual pour window", "temperature-difference", true),
  n("hydrogenSolubilityCm3Per100g", "hydrogen solubility at the melt temperature", "hydrogen", true),
  n("vapourPressureKPa", "water vapour pressure of the air", "pressure", true),
  e("moistureRisk", "moisture risk", MOISTURE_RISKS, true),
  // Free fall down the sprue: kept for shop rules written before the gating was modelled. It is not
  // the speed at which metal enters the cavity; the shipped rules read the ingate velocity.
  n("frontVelocityMS", "free-fall velocity at the sprue base (not the ingate velocity)", "velocity", true),
  n("velocityGuideMS", "critical ingate velocity for this section", "velocity", true),
  n("frontVelocityRatio", "free-fall velocity over the critical velocity (not the ingate velocity)", "ratio", true),
  n("sprueBaseVelocityMS", "sprue-base velocity (with losses)", "velocity", true),
  n("ingateVelocityMS", "ingate velocity (from the gating areas)", "velocity", true),
  n("ingateVelocityRatio", "ingate velocity over the critical velocity", "ratio", true),
  b("pressurisedGating", "pressurised gating (ingates no larger than the sprue base)", true),
  e("sandTemper", "sand temper (compactability, feel or water against the sand type)", TEMPERS, true),
  e("sandTemperBasis", "what the sand temper was judged by", TEMPER_BASES, true),
  n("carbonEquivalentPct", "carbon equivalent", "percent", true),
  n("sectionRatio", "thickest over thinnest section", "ratio", true),
  n("freezeTimeRatio", "freezing time of thickest over thinnest section", "ratio", true),
  n("thickSectionModulusMm", "modulus of the thickest section", "length", true),
  n("defectCount", "marked defects", "count", true),
  n("worstSeverity", "worst severity marked", "count", true),
];

export const FACT_NAMES: ReadonlySet<string> = new Set(FACTS.map((f) => f.name));
export const factSpec = (name: string) => FACTS.find((f) => f.name === name);

/** The facts object the engine reads: every catalogued fact, undefined where unknown. */
export type Facts = Record<string, number | boolean | string | undefined>;
