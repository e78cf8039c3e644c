import type { Page } from "playwright-core";
import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

async function storedFurnace(page: Page, meltId: number) {
  return (await (await page.request.get(`${baseUrl}/api/melts/${meltId}`)).json()).furnace as string;
}

async function setFurnace(page: Page, value: string) {
  const field = page.getByLabel("Furnace", { exact: true });
  await field.fill(value);
}

/**
 * Two people open the same melt's edit form; the first saves; the second, saving over a version that
 * has moved on, is shown both values instead of overwriting (server/http/row-version.ts).
 */
describe("editing a melt someone else has just changed", () => {
  it("shows both versions, keeps mine on request, or takes theirs", async () => {
    const caster = await signedInAs(browser(), baseUrl, PHONE, "caster");
    const mentor = await signedInAs(browser(), baseUrl, WIDE, "mentor");
    // A melt of its own, like one of the demo shop's, so no other test's melt is changed.
    const demo = (await (await caster.request.get(`${baseUrl}/api/melts?pageSize=1`)).json()).items[0];
    const made = await caster.request.post(`${baseUrl}/api/melts`, {
      data: {
        pouredOn: demo.pouredOn,
        alloy: demo.alloy,
        process: demo.process,
        furnace: "Pot as opened",
        pourTempC: 700,
      },
    });
    expect(made.status(), await made.text()).toBe(201);
    const meltId = (await made.json()).id as number;
    const edit = `${baseUrl}/melts/${meltId}/edit`;
    await caster.goto(edit);
    await mentor.goto(edit);
    await expect.poll(() => caster.getByLabel("Furnace", { exact: true }).inputValue()).toBe("Pot as opened");
    await expect.poll(() => mentor.getByLabel("Furnace", { exact: true }).inputValue()).toBe("Pot as opened");

    // The mentor saves first.
    await setFurnace(mentor, "Mentor's crucible");
    await mentor.getByTestId("save-melt").click();
    await expect.poll(() => storedFurnace(caster, meltId)).toBe("Mentor's crucible");

    // The caster, still on the version opened, saves and is told, with both values side by side.
    await setFurnace(caster, "Caster's pot");
    await caster.getByTestId("save-melt").click();
    await seen(caster, "Changed by someone else since you opened it");
    const notice = caster.getByTestId("stale-edit");
    await expect.poll(() => notice.getByText("Caster's pot").count()).toBe(1);
    await expect.poll(() => notice.getByText("Mentor's crucible").count()).toBe(1);
    expect(await storedFurnace(caster, meltId)).toBe("Mentor's crucible");
    await longShot(caster, "stale-edit-390");

    await caster.getByTestId("keep-mine").click();
    await expect.poll(() => storedFurnace(caster, meltId)).toBe("Caster's pot");
    await expect.poll(() => caster.url()).toMatch(new RegExp(`/melts/${meltId}$`));

    // The mentor's form is now the stale one: at 1280 px, taking theirs reloads the form with it.
    await mentor.goto(edit);
    await expect.poll(() => mentor.getByLabel("Furnace", { exact: true }).inputValue()).toBe("Caster's pot");
    await caster.request.patch(`${baseUrl}/api/melts/${meltId}`, { data: { furnace: "Caster's second pot" } });
    await setFurnace(mentor, "Mentor again");
    await mentor.getByTestId("save-melt").click();
    await seen(mentor, "Changed by someone else since you opened it");
    await longShot(mentor, "stale-edit-1280");
    await mentor.getByTestId("take-theirs").click();
    await expect.poll(() => mentor.getByLabel("Furnace", { exact: true }).inputValue()).toBe("Caster's second pot");
    await expect.poll(() => mentor.getByTestId("stale-edit").count()).toBe(0);
    expect(await storedFurnace(caster, meltId)).toBe("Caster's second pot");
  });
});

describe("editing a casting someone else has just changed", () => {
  it.each([
    ["390", PHONE],
    ["1280", WIDE],
  ] as const)("at %s px shows both versions of the notes and keeps mine on request", async (width, size) => {
    const mentor = await signedInAs(browser(), baseUrl, size, "mentor");
    const demo = (await (await mentor.request.get(`${baseUrl}/api/castings?pageSize=1`)).json()).items[0];
    const made = await mentor.request.post(`${baseUrl}/api/castings/melts/${demo.meltId}`, {
      data: { partName: "Test bracket", notes: "Notes as opened" },
    });
    expect(made.status(), await made.text()).toBe(201);
    const casting = await made.json();
    await mentor.goto(`${baseUrl}/melts/${demo.meltId}/castings/${casting.id}`);
    await mentor.getByRole("button", { name: "Change sizes and details" }).click();
    const notes = mentor.getByLabel("Notes", { exact: true });
    await expect.poll(() => notes.inputValue()).toBe("Notes as opened");
    // Someone else saves first, through the API.
    await mentor.request.patch(`${baseUrl}/api/castings/${casting.id}`, { data: { notes: "Their notes" } });
    await notes.fill("My notes");
    await mentor.getByTestId("save-casting").click();
    await seen(mentor, "Changed by someone else since you opened it");
    const notice = mentor.getByTestId("stale-edit");
    await expect.poll(() => notice.getByText("Their notes").count()).toBe(1);
    await expect.poll(() => notice.getByText("My notes").count()).toBe(1);
    // One notice, not a second error box saying the same.
    expect(await mentor.getByText("Changed by someone else since you opened it").count()).toBe(1);
    await longShot(mentor, `stale-edit-casting-${width}`);
    await mentor.getByTestId("keep-mine").click();
    const stored = async () =>
      (await (await mentor.request.get(`${baseUrl}/api/castings/${casting.id}`)).json()).notes as string;
    await expect.poll(stored).toBe("My notes");
  });
});
