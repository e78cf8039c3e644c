import { eq } from "drizzle-orm";
import { db } from "../../server/db";
import { castings, defectMarks, melts } from "../../db/schema";
import type { CastingInput, MeltInput } from "../../lib/notebook-schemas";
import type { Person } from "./helpers";

/**
 * Inputs for the notebook tests. The lost-foam melt is the textbook misrun case: A356 (liquidus
 * 615 °C [mem] ASM Vol. 2, in docs/foundry-facts.md) poured at 700 °C, a superheat of 85 °C,
 * below the roughly 730-790 °C lost foam usually needs [mem], into 4 mm walls.
 */
export const coldLostFoamMelt: MeltInput = {
  pouredOn: "2026-01-14",
  alloy: "A356.0",
  process: "lost-foam",
  charge: "ingot",
  furnace: "Propane pot #2",
  meltTempC: 720,
  pourTempC: 700,
  degassing: "argon-lance",
  degasMinutes: 6,
  fluxed: true,
  skimmed: true,
  ambientTempC: 4,
  humidityPct: 45,
  sandMoisturePct: 0,
  coatingApplied: true,
  coatingDried: true,
  coatingCoats: 1,
  foamDensityKgM3: 20,
  notes: "Cold shop; pot cooled while the flask was carried over",
};

export const thinPlate: CastingInput = {
  partName: "Ribbed cover plate",
  pattern: "Foam P-12",
  minSectionMm: 4,
  maxSectionMm: 12,
  sprueHeightMm: 200,
  pourTimeS: 6,
  hasRiser: false,
  hasOverflow: false,
  hasVents: false,
  orientation: "ribs up",
  outcome: "scrap",
  notes: "Far corner of the ribs never filled",
};

export async function newMelt(p: Person, input: Partial<MeltInput> = {}) {
  const res = await p.agent.post("/api/melts").send({ ...coldLostFoamMelt, ...input });
  if (res.status !== 201) throw new Error(`melt: ${res.status} ${res.text}`);
  return res.body as { id: number; version: number };
}

/** Marks as plain JSON (the tests also send values the API must refuse). */
type LooseMark = { type: string; location: string; severity: number; note?: string };

export async function newCasting(
  p: Person,
  meltId: number,
  input: Partial<Omit<CastingInput, "marks">> & { marks?: LooseMark[] } = {},
) {
  const res = await p.agent.post(`/api/castings/melts/${meltId}`).send({ ...thinPlate, ...input });
  if (res.status !== 201) throw new Error(`casting: ${res.status} ${res.text}`);
  return res.body as { id: number; version: number };
}

/** Row counts of a shop, to show that a refused request stored nothing. */
export async function shopCounts(shopId: string) {
  const [m, c, k] = await Promise.all([
    db.$count(melts, eq(melts.shopId, shopId)),
    db.$count(castings, eq(castings.shopId, shopId)),
    db.$count(defectMarks, eq(defectMarks.shopId, shopId)),
  ]);
  return { melts: m, castings: c, marks: k };
}
