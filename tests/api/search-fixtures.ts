import type { Person } from "./helpers";
import { shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

/**
 * A small casebook built through the notebook's own routes, so the search sees exactly what the
 * app stores. Superheats use the alloy table's liquidus (A356.0 615 °C, 319.0 605 °C [mem], from
 * rules/alloys.ts): melt 1 is 85 °C over, melt 3 115 °C, melt 4 125 °C, melt 2 155 °C, melt 5 155 °C. Casting 6 is the
 * next plate after casting 5, poured 40 °C hotter: the fix that worked.
 */
export type Casebook = Awaited<ReturnType<typeof buildCasebook>>;

const melt = (p: Person, pouredOn: string, alloy: string, process: string, pourTempC: number, extra = {}) =>
  newMelt(p, {
    pouredOn,
    alloy,
    process: process as never,
    pourTempC,
    meltTempC: pourTempC + 20,
    notes: null,
    ...extra,
  });

export async function buildCasebook(name: string) {
  const crew = await shopWithCrew(name);
  const { caster, mentor } = crew;
  const m1 = await melt(caster, "2026-01-10", "A356.0", "lost-foam", 700);
  const m2 = await melt(caster, "2026-02-05", "319.0", "green-sand", 760, {
    degassing: "rotary",
    coatingApplied: null,
    coatingDried: null,
    coatingCoats: null,
    foamDensityKgM3: null,
  });
  const m3 = await melt(caster, "2026-03-01", "A356.0", "lost-foam", 730);
  const m4 = await melt(mentor, "2026-03-15", "A356.0", "green-sand", 740, {
    coatingApplied: null,
    coatingDried: null,
    coatingCoats: null,
    foamDensityKgM3: null,
  });
  const m5 = await melt(caster, "2026-03-20", "A356.0", "lost-foam", 770);
  const plate = { partName: "Ribbed cover plate", minSectionMm: 4, maxSectionMm: 12, notes: "Far corner never filled" };
  const c1 = await newCasting(caster, m1.id, {
    ...plate,
    outcome: "scrap",
    marks: [{ type: "misrun", location: "top", severity: 3 }],
  });
  const c2 = await newCasting(caster, m1.id, {
    partName: "Impeller",
    pattern: null,
    minSectionMm: 6,
    maxSectionMm: 20,
    outcome: "rework",
    notes: "Pinholes after machining",
    marks: [{ type: "gas-porosity", location: "throughout", severity: 2 }],
  });
  const c3 = await newCasting(caster, m2.id, {
    partName: "Pump housing",
    pattern: null,
    minSectionMm: 5,
    maxSectionMm: 30,
    outcome: "scrap",
    notes: null,
    marks: [{ type: "cold-shut", location: "near-gate", severity: 2 }],
  });
  const c4 = await newCasting(caster, m2.id, {
    partName: "Bracket",
    pattern: null,
    minSectionMm: 8,
    maxSectionMm: 15,
    outcome: "good",
    notes: null,
    marks: [],
  });
  const c5 = await newCasting(caster, m3.id, {
    ...plate,
    outcome: "scrap",
    notes: null,
    marks: [
      { type: "misrun", location: "top", severity: 2 },
      { type: "rounded-edges", location: "corner", severity: 1 },
    ],
  });
  const c6 = await newCasting(caster, m5.id, { ...plate, outcome: "good", notes: null, marks: [] });
  const c7 = await newCasting(mentor, m4.id, {
    partName: "Valve body",
    pattern: null,
    minSectionMm: 6,
    maxSectionMm: 25,
    outcome: "scrap",
    notes: "Sand was damp, porosity under the cope",
    marks: [{ type: "gas-porosity", location: "top", severity: 3 }],
  });
  await ok(
    caster.agent.post(`/api/comments/castings/${c3.id}`).send({ body: "No porosity seen when it was cut open" }),
  );
  await ok(
    mentor.agent
      .post(`/api/review/castings/${c5.id}/confirmations`)
      .send({ causeId: "cold-pour", note: "pot sat too long" }),
  );
  await ok(
    caster.agent
      .post(`/api/followups/castings/${c5.id}/fixes`)
      .send({ fix: "Poured 40 °C hotter", nextCastingId: c6.id, worked: "yes" }),
  );
  return {
    ...crew,
    melts: { m1, m2, m3, m4, m5 },
    ids: { c1: c1.id, c2: c2.id, c3: c3.id, c4: c4.id, c5: c5.id, c6: c6.id, c7: c7.id },
  };
}

async function ok(req: PromiseLike<{ status: number; text: string }>) {
  const res = await req;
  if (res.status >= 300) throw new Error(`fixture: ${res.status} ${res.text}`);
  return res;
}
