import type { Page } from "playwright-core";
import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, shot, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();
const signedIn = (size: { width: number; height: number }, role: string) => signedInAs(browser(), baseUrl, size, role);

/** A caster's defect on a part poured through a tall sprue, logged through the API with the caster's session. */
async function markedCasting(caster: Page, partName: string, defect: string) {
  const melt = await caster.request.post(`${baseUrl}/api/melts`, {
    data: { pouredOn: "2026-03-10", alloy: "A356.0", process: "green-sand", pourTempC: 720, meltTempC: 740 },
  });
  expect(melt.status()).toBe(201);
  const meltId = (await melt.json()).id;
  const casting = await caster.request.post(`${baseUrl}/api/castings/melts/${meltId}`, {
    data: { partName, sprueHeightMm: 320, marks: [{ type: defect, location: "side", severity: 2 }] },
  });
  expect(casting.status()).toBe(201);
  return { meltId, castingId: (await casting.json()).id as number };
}

// Each size writes a rule for a defect of its own, so the other size's published rule does not hide this one's effect.
for (const [sizeName, size, defect, defectLabel] of [
  ["phone", PHONE, "flash", "Flash or fin"],
  ["wide", WIDE, "swell", "Swell"],
] as const) {
  describe(`rulebook at ${sizeName} size (${size.width} px)`, () => {
    it("a mentor writes a rule, tries it, publishes it, and a caster's diagnosis shows it", async () => {
      const cause = `Cope lifted by the head (${sizeName})`;
      const caster = await signedIn(size, "caster");
      const { meltId, castingId } = await markedCasting(caster, `Gear blank ${sizeName}`, defect);

      const mentor = await signedIn(size, "mentor");
      await mentor.getByRole("tab", { name: "Rulebook" }).click();
      await seen(mentor, /in use here/);
      await mentor.getByTestId("write-rule").click();
      await seen(mentor, "What it explains");
      // Nothing filled in: each part says what it needs, and nothing is sent.
      await mentor.getByTestId("save-rule").click();
      await seen(mentor, "choose at least one defect this rule explains");
      await seen(mentor, "choose a cause");

      await mentor.getByRole("checkbox", { name: defectLabel, exact: true }).click();
      await mentor.getByLabel("Find what to look at").fill("sprue");
      await mentor.getByRole("button", { name: "Look at sprue height" }).click();
      await mentor.getByRole("radio", { name: "is above" }).click();
      await mentor.getByLabel("Value (mm)").fill("250");
      await mentor.getByRole("radio", { name: "a new one" }).click();
      await mentor.getByLabel("Name of the cause").fill(cause);
      await mentor.getByLabel("Fixes to try, one per line").fill("Weight or clamp the cope before pouring");
      await mentor.getByRole("radio", { name: "strong evidence (0.8)" }).click();
      const reason = mentor.getByLabel("Reason, shown with the diagnosis");
      await reason.fill("A tall sprue pushes hard on the cope:");
      // The rule's own fact is offered as a chip; tapping it puts its placeholder in, and the preview fills it.
      await mentor.getByRole("button", { name: "Insert sprue height" }).click();
      expect(await reason.inputValue()).toBe("A tall sprue pushes hard on the cope: {sprueHeightMm} mm");
      await expect
        .poll(() => mentor.getByTestId("reason-preview").textContent())
        .toMatch(/A tall sprue pushes hard on the cope: \d+ mm/);
      expect(await mentor.getByTestId("reason-preview").textContent()).not.toContain("{");
      await expect.poll(() => mentor.getByText("choose a cause").count()).toBe(0);

      await mentor.getByTestId("try-rule").click();
      await expect.poll(() => mentor.getByTestId("trial-results").count(), { timeout: 20000 }).toBe(1);
      expect(await mentor.getByTestId("trial-fired").textContent()).toMatch(/it fires on [1-9]/);
      const opened = mentor.getByTestId("trial-case").filter({ hasText: `Gear blank ${sizeName}` });
      expect(await opened.count()).toBe(1);
      expect(await opened.textContent()).toContain(cause);
      await longShot(mentor, `${sizeName}-rule-form-tried`);

      await mentor.getByTestId("save-rule").click();
      await expect
        .poll(() => mentor.getByTestId("rule-state").textContent(), { timeout: 15000 })
        .toMatch(/Written here · draft/);
      await mentor.getByTestId("publish-rule").click();
      await expect.poll(() => mentor.getByTestId("rule-state").textContent(), { timeout: 15000 }).toMatch(/in use/);
      await seen(mentor, "Published: now used in every diagnosis here");
      await seen(mentor, "sprue height is above 250 mm");
      await longShot(mentor, `${sizeName}-rule-published`);

      await caster.goto(`${baseUrl}/melts/${meltId}/castings/${castingId}`);
      await caster.getByTestId("find-causes").click();
      await expect.poll(() => caster.getByTestId("cause-1").textContent(), { timeout: 20000 }).toContain(cause);
      await longShot(caster, `${sizeName}-caster-diagnosis`);

      // Casters read the rulebook but do not write in it.
      await caster.goto(`${baseUrl}/rulebook`);
      await seen(caster, cause);
      expect(await caster.getByTestId("write-rule").count()).toBe(0);
      await shot(caster, `${sizeName}-caster-rulebook`);
      await mentor.context().close();
      await caster.context().close();
    });
  });
}
