import { describe, expect, inject, it } from "vitest";
import { DEMO_PEOPLE } from "../../server/seed/demo-people";
import { waitForMail } from "../api/mail";
import { PHONE, shot, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();
const signedIn = (role: string, size: { width: number; height: number }) => signedInAs(browser(), baseUrl, size, role);

describe("a casting's review and thread", () => {
  it("a caster writes a note and asks for review; a mentor confirms the cause; the caster sees it", async () => {
    const caster = await signedIn("caster", PHONE);
    // A demo casting with marks, diagnosed first through the API the page itself uses.
    const list = await (await caster.request.get(`${baseUrl}/api/castings?pageSize=50`)).json();
    // One nobody has asked about or answered yet (the demo shop has both kinds).
    let target: { id: number; meltId: number; partName: string } | undefined;
    for (const c of list.items.filter((x: { markCount: number }) => x.markCount > 0)) {
      const review = await (await caster.request.get(`${baseUrl}/api/review/castings/${c.id}`)).json();
      if (!review.waiting && !review.current) {
        target = c;
        break;
      }
    }
    if (!target) throw new Error("no unreviewed demo casting with marks");
    expect((await caster.request.post(`${baseUrl}/api/diagnosis/castings/${target.id}`)).status()).toBe(201);
    const url = `${baseUrl}/melts/${target.meltId}/castings/${target.id}`;

    await caster.goto(url);
    // The demo casebook has other cases with marks, so the page offers the most similar of them.
    await expect.poll(() => caster.getByTestId("similar-cases").count(), { timeout: 10000 }).toBe(1);
    await caster.getByLabel("Add a note or question").fill("Pinholes only on the cope side");
    await caster.getByRole("button", { name: "Post" }).click();
    await expect.poll(() => caster.getByText("Pinholes only on the cope side").count(), { timeout: 10000 }).toBe(1);
    await caster.getByTestId("ask-review").click();
    await expect.poll(() => caster.getByText(/Waiting for a mentor since/).count(), { timeout: 10000 }).toBe(1);
    await shot(caster, "phone-casting-review-asked");

    const mentor = await signedIn("mentor", WIDE);
    await mentor.goto(`${baseUrl}/rulebook/review`);
    await expect.poll(() => mentor.getByText(target.partName).count(), { timeout: 10000 }).toBeGreaterThan(0);
    // The navigation counts the waiting cases for mentors; the request reached them by e-mail too.
    await expect
      .poll(() => mentor.getByTestId("nav-count-rulebook").textContent(), { timeout: 10000 })
      .toMatch(/^[1-9]/);
    expect(await caster.getByTestId("nav-count-rulebook").count()).toBe(0);
    const [notice] = await waitForMail(DEMO_PEOPLE.find((p) => p.role === "mentor")!.email);
    expect(notice.text).toContain(target.partName);
    await shot(mentor, "wide-review-queue");
    await mentor.goto(url);
    await expect.poll(() => mentor.getByText("Pinholes only on the cope side").count(), { timeout: 10000 }).toBe(1);
    const firstCause = mentor
      .getByRole("radiogroup", { name: "Causes the diagnosis listed" })
      .getByRole("radio")
      .first();
    await firstCause.click();
    await mentor.getByTestId("confirm-cause").click();
    await expect.poll(() => mentor.getByTestId("confirmed-cause").count(), { timeout: 10000 }).toBe(1);
    await shot(mentor, "wide-casting-confirmed");

    await caster.reload();
    await expect.poll(() => caster.getByTestId("confirmed-cause").count(), { timeout: 10000 }).toBe(1);
    expect(await caster.getByTestId("confirm-cause").count()).toBe(0); // a caster may not confirm
    await shot(caster, "phone-casting-confirmed");
    await caster.context().close();
    await mentor.context().close();
  });
});
