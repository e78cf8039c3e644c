import { describe, expect, inject, it } from "vitest";
import { longShot, PHONE, seen, shot, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

// Invented parts poured long before the demo shop's own melts; the third row has no part name.
const LOG = [
  "Poured on,Alloy,Process,Pour temp (F),Thinnest section (in),Part name,Outcome",
  "2019-05-04,A356.0,green sand,1350,thin,Old tiller bracket,good",
  "2019-05-04,A356.0,green sand,1350,0.25,Old tiller bracket,good",
  "2019-05-04,A356.0,green sand,1350,0.3,,scrap",
  "2019-05-04,A356.0,green sand,1350,0.3,Old hinge leaf,rework",
].join("\n");

describe("importing a pour log in the browser", () => {
  it("the owner maps the columns, sees the refused rows and why, imports the rest once", async () => {
    const page = await signedInAs(browser(), baseUrl, WIDE, "owner");
    await page.goto(`${baseUrl}/more`);
    await seen(page, "Units in the file");
    await longShot(page, "wide-more-owner");
    await page.getByTestId("import-link").click();
    await seen(page, "Import a pour log");
    const chooser = page.waitForEvent("filechooser");
    await page.getByTestId("import-choose").click();
    await (await chooser).setFiles({ name: "old-log.csv", mimeType: "text/csv", buffer: Buffer.from(LOG) });

    // Line 2 gives the section in words, line 4 no part name: both refused, each with its reason.
    await expect.poll(() => page.getByTestId("import-preview").count(), { timeout: 15000 }).toBe(1);
    await seen(page, "2 to import · 2 refused");
    await seen(page, "Part name: name the part");
    await seen(page, 'Thinnest section: "thin" is not a number');
    expect(await page.getByTestId("refused-line-4").count()).toBe(1);
    // The header said °F and inches; the owner can see and change each column's unit.
    const pourUnit = page.getByRole("radiogroup", { name: "Unit of Pour temp (F)" });
    expect(await pourUnit.getByRole("radio", { name: "°F" }).getAttribute("aria-checked")).toBe("true");
    await shot(page, "wide-import-preview");

    // Leaving out the part name column makes every row unreadable: the preview says what is missing.
    await page.getByRole("button", { name: "Field for column Part name" }).click();
    await page
      .getByRole("radiogroup", { name: "Field for Part name" })
      .getByRole("radio", { name: "leave out" })
      .click();
    await seen(page, 'map a column to "Part name"');
    await page.getByRole("button", { name: "Field for column Part name" }).click();
    await page
      .getByRole("radiogroup", { name: "Field for Part name" })
      .getByRole("radio", { name: "Part name *" })
      .click();
    await seen(page, "2 to import · 2 refused");

    await page.getByTestId("import-run").click();
    await seen(page, "Imported 2 castings in 1 melt. 2 refused, listed above.");
    await seen(page, "2 imported before · 2 refused");
    expect(await page.getByTestId("import-run").count()).toBe(0);
    const list = await (await page.request.get(`${baseUrl}/api/castings?pageSize=100&sort=date-asc`)).json();
    const ours = list.items.filter((c: { partName: string }) => c.partName.startsWith("Old "));
    expect(ours.map((c: { partName: string }) => c.partName)).toEqual(["Old tiller bracket", "Old hinge leaf"]);
    await longShot(page, "wide-import-done");
    await page.context().close();
  });

  it("fits a phone, and is not offered to a caster", async () => {
    const page = await signedInAs(browser(), baseUrl, PHONE, "owner");
    await page.goto(`${baseUrl}/more`);
    await seen(page, "Units in the file");
    await longShot(page, "phone-more-owner");
    await page.goto(`${baseUrl}/more/import`);
    const chooser = page.waitForEvent("filechooser");
    await page.getByTestId("import-choose").click();
    await (await chooser).setFiles({ name: "old-log.csv", mimeType: "text/csv", buffer: Buffer.from(LOG) });
    await expect.poll(() => page.getByTestId("import-preview").count(), { timeout: 15000 }).toBe(1);
    await longShot(page, "phone-import-preview");
    await page.context().close();

    const caster = await signedInAs(browser(), baseUrl, PHONE, "caster");
    await caster.goto(`${baseUrl}/more`);
    await seen(caster, "Your units");
    expect(await caster.getByTestId("import-link").count()).toBe(0);
    await caster.goto(`${baseUrl}/more/import`);
    await seen(caster, "Only the shop's owner can import a pour log.");
    await caster.context().close();
  });
});
