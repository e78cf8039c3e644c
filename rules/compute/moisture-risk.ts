import type { Charge, Process, SandType } from "../case";
import { MOISTURE_BAND_PCT, UNKNOWN_SAND_BAND_PCT } from "./green-sand";

/**
 * How much water the melt and mould may meet: water is where the hydrogen in gas porosity comes from
 * (humidity, wet charge or tools: ASM Metals Handbook Desk Edition [hb]) and what makes blowholes in
 * the mould. Each source scores points; 0 is low, 1 moderate, 2 or more high. The thresholds are
 * common practice chosen for this project, not figures from a source; degassing is a separate fact
 * the rules weigh against this one.
 */
export type MoistureRisk = "low" | "moderate" | "high";

/** Water vapour in the air, kPa: 2.0 is a dew point near 17.5 °C (muggy), 1.2 near 10 °C. */
export const HUMID_AIR_KPA = 2.0;
export const DAMP_AIR_KPA = 1.2;
/** Without an air temperature, relative humidity alone. */
export const HUMID_AIR_PCT = 80;
export const DAMP_AIR_PCT = 60;
/**
 * Green sand is wet above the top of its sand type's band (synthetic bentonite about 4.5 %, natural-bonded
 * about 8 % [mem]; docs/gating-and-copper-facts.md "Green sand"); with no type logged, above 8 %.
 */
export const GREEN_SAND_WET_PCT = UNKNOWN_SAND_BAND_PCT[1];
/** Other sand processes use dry sand: more than 1 % water is unusual (common practice). */
export const DRY_SAND_WET_PCT = 1;

export type MoistureInputs = {
  process: Process;
  vapourPressureKPa?: number;
  humidityPct?: number;
  sandMoisturePct?: number;
  coatingApplied?: boolean;
  coatingDried?: boolean;
  charge?: Charge;
  sandType?: SandType;
};

function airPoints(m: MoistureInputs): number | undefined {
  if (m.vapourPressureKPa !== undefined) {
    return m.vapourPressureKPa >= HUMID_AIR_KPA ? 2 : m.vapourPressureKPa >= DAMP_AIR_KPA ? 1 : 0;
  }
  if (m.humidityPct !== undefined) return m.humidityPct >= HUMID_AIR_PCT ? 2 : m.humidityPct >= DAMP_AIR_PCT ? 1 : 0;
  return undefined;
}

function sandPoints(m: MoistureInputs): number | undefined {
  if (m.sandMoisturePct === undefined) return undefined;
  const wetPct = m.sandType
    ? MOISTURE_BAND_PCT[m.sandType][1]
    : m.process === "green-sand"
      ? GREEN_SAND_WET_PCT
      : DRY_SAND_WET_PCT;
  return m.sandMoisturePct > wetPct ? 2 : 0;
}

/** A water-based coating not dried puts water against the metal (lost foam, investment, cores). */
function coatingPoints(m: MoistureInputs): number | undefined {
  if (m.coatingApplied === false) return 0;
  if (m.coatingApplied === true && m.coatingDried !== undefined) return m.coatingDried ? 0 : 2;
  return undefined;
}

/** Mixed scrap brings water, oil and corrosion into the melt ([web] Aluminum Association on wet scrap). */
function chargePoints(m: MoistureInputs): number | undefined {
  if (m.charge === undefined) return undefined;
  return m.charge === "mixed-scrap" ? 1 : 0;
}

/** Undefined when nothing about moisture is known: an unknown is not a low risk. */
export function moistureRisk(m: MoistureInputs): MoistureRisk | undefined {
  const known = [airPoints(m), sandPoints(m), coatingPoints(m), chargePoints(m)].filter(
    (p): p is number => p !== undefined,
  );
  if (known.length === 0) return undefined;
  const points = known.reduce((sum, p) => sum + p, 0);
  return points >= 2 ? "high" : points === 1 ? "moderate" : "low";
}
