import { uniqueEmail, type Person, shopWithCrew } from "./helpers";
import { coldLostFoamMelt, newCasting, newMelt, thinPlate } from "./notebook-fixtures";

/**
 * One valid request for every JSON write route, on a fresh shop of the caller's database: the
 * hostile-input test (tests/api/hostile-input.test.ts) and the property tests
 * (tests/api/json-writes.property.test.ts) each bend these bodies.
 */
export type Write = { method: "POST" | "PATCH" | "PUT"; path: string; body: Record<string, unknown> };

export const draft = {
  defectTypes: ["flash"],
  locations: [],
  conditions: [{ fact: "sprueHeightMm", comparison: "above", value: 250 }],
  cause: { kind: "new", title: "Cope lifted", fixes: ["Weight the cope"] },
  weight: 0.9,
  because: "A {sprueHeightMm} mm sprue pushes on the cope",
  sources: ["shop experience"],
};

/** A shop with a melt, castings, a mark, a fix and a rule, and one valid write of each route on them. */
export async function jsonWrites(shopName: string): Promise<{
  crew: Awaited<ReturnType<typeof shopWithCrew>>;
  owner: Person;
  ids: Record<string, string | number>;
  writes: Write[];
}> {
  const crew = await shopWithCrew(shopName);
  const owner = crew.owner;
  const melt = await newMelt(owner);
  const casting = await newCasting(owner, melt.id, { marks: [{ type: "misrun", location: "corner", severity: 2 }] });
  const next = await newCasting(owner, melt.id);
  const mark = await owner.agent
    .post(`/api/marks/castings/${casting.id}`)
    .send({ type: "misrun", location: "top", severity: 1 });
  const fix = await owner.agent.post(`/api/followups/castings/${casting.id}/fixes`).send({ fix: "Pour hotter" });
  const rule = await owner.agent.post("/api/rulebook/rules").send(draft);
  const ids = { melt: melt.id, casting: casting.id, mark: mark.body.id, fix: fix.body.id, rule: rule.body.id };
  const writes: Write[] = [
    {
      method: "PATCH",
      path: "/api/shops/current/settings",
      body: { defaultAlloy: "A356.0", defaultProcess: "lost-foam" },
    },
    { method: "PUT", path: "/api/people/me/units", body: { temperature: "C", length: "mm", mass: "kg" } },
    {
      method: "POST",
      path: "/api/alloys",
      body: {
        designation: "ZA-8",
        family: "al-zn",
        solidusC: 375,
        liquidusC: 404,
        densityKgM3: 6300,
        shrinkAllowancePct: 1,
        sources: "shop",
      },
    },
    { method: "POST", path: "/api/melts", body: { ...coldLostFoamMelt } },
    { method: "PATCH", path: `/api/melts/${melt.id}`, body: { notes: "re-read", pouredOn: "2026-01-15" } },
    {
      method: "POST",
      path: `/api/castings/melts/${melt.id}`,
      body: { ...thinPlate, marks: [{ type: "misrun", location: "top", severity: 2, note: "n" }] },
    },
    { method: "PATCH", path: `/api/castings/${casting.id}`, body: { notes: "re-read", partName: "Plate" } },
    {
      method: "POST",
      path: `/api/marks/castings/${casting.id}`,
      body: { type: "misrun", location: "top", severity: 2, note: "n" },
    },
    { method: "PATCH", path: `/api/marks/${mark.body.id}`, body: { note: "n", severity: 3 } },
    { method: "POST", path: `/api/comments/castings/${casting.id}`, body: { body: "a comment" } },
    {
      method: "POST",
      path: "/api/diagnosis",
      body: {
        defects: [{ type: "misrun", location: "top", severity: 2 }],
        alloy: "A356.0",
        process: "lost-foam",
        pourTempC: 700,
      },
    },
    { method: "POST", path: `/api/review/castings/${casting.id}/requests`, body: { note: "please look" } },
    {
      method: "POST",
      path: `/api/review/castings/${casting.id}/confirmations`,
      body: { causeText: "cold metal", note: "n" },
    },
    {
      method: "POST",
      path: `/api/followups/castings/${casting.id}/fixes`,
      body: { fix: "Pour hotter", nextCastingId: next.id },
    },
    { method: "PUT", path: `/api/followups/castings/${casting.id}/ticks`, body: { fix: "Pour hotter", ticked: true } },
    {
      method: "PATCH",
      path: `/api/followups/fixes/${fix.body.id}`,
      body: { fix: "Pour hotter still", nextCastingId: next.id },
    },
    { method: "POST", path: "/api/rulebook/rules", body: draft },
    { method: "PUT", path: `/api/rulebook/rules/${rule.body.id}`, body: draft },
    { method: "PUT", path: "/api/rulebook/rules/h2-no-degassing/switch", body: { off: true } },
    { method: "POST", path: "/api/rulebook/try", body: { draft, ruleId: rule.body.id } },
    {
      method: "POST",
      path: "/api/calculations",
      body: {
        kind: "riser",
        meltId: melt.id,
        castingId: casting.id,
        input: { shape: "plate", lengthMm: 125, widthMm: 75, thicknessMm: 20 },
      },
    },
    { method: "PUT", path: "/api/people/me/notices", body: { reviewRequested: true, causeConfirmed: false } },
    { method: "PATCH", path: "/api/people/me", body: { name: "Hostile Owner" } },
    {
      method: "POST",
      path: "/api/people/me/password",
      body: { currentPassword: "not-the-password-1", newPassword: "quarry-ladle-sprue-77" },
    },
    { method: "POST", path: "/api/people/invitations", body: { email: uniqueEmail("hostile"), role: "caster" } },
    { method: "PATCH", path: `/api/people/members/${crew.caster.userId}`, body: { role: "mentor" } },
  ];
  return { crew, owner, ids, writes };
}
