import { describe, expect, inject, it } from "vitest";
import { linkIn, waitForMail } from "../api/mail";
import { longShot, PHONE, seen, shot, signedInAs, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

describe("inviting someone new", () => {
  it("tells a different signed-in account that the link is not theirs", async () => {
    const owner = await signedInAs(browser(), baseUrl, PHONE, "owner");
    const email = `someone-else-${Date.now()}@test.example`;
    const res = await owner.request.post(`${baseUrl}/api/people/invitations`, {
      data: { email, role: "caster" },
      headers: { Origin: baseUrl },
    });
    expect(res.status()).toBe(201);
    const link = linkIn((await waitForMail(email))[0]);
    await owner.goto(link.href);
    await expect.poll(() => owner.getByTestId("wrong-account").count(), { timeout: 15000 }).toBe(1);
    await shot(owner, "phone-invitation-wrong-account");
    await owner.context().close();
  });

  it("owner invites -> the message is caught over SMTP -> its link, in chromium, signs the person up into the shop", async () => {
    const owner = await signedInAs(browser(), baseUrl, WIDE, "owner");
    await owner.getByRole("tab", { name: "More" }).click();
    await seen(owner, "Invite someone");
    const email = `new-mentor-${Date.now()}@test.example`;
    await owner.getByLabel("Invite by e-mail").fill(email);
    await owner.getByRole("radio", { name: "Mentor" }).click();
    await owner.getByRole("button", { name: "Send invitation" }).click();
    await seen(owner, `Invitation sent to ${email}.`);
    await seen(owner, email);
    await longShot(owner, "wide-owner-people");

    const [message] = await waitForMail(email);
    expect(message.subject).toContain("Quillstone Foundry Lab");
    const link = linkIn(message);
    expect(link.origin).toBe(baseUrl);

    const page = await (await browser().newContext({ viewport: PHONE })).newPage();
    await page.goto(link.href);
    await seen(page, "Join Quillstone Foundry Lab");
    expect(await page.getByTestId("invited-role").textContent()).toBe("mentor");
    await shot(page, "phone-invitation-new-person");
    await page.getByLabel("Your name").fill("Nell Ladle");
    await page.getByLabel("Choose a password").fill("a-long-new-password");
    await page.getByRole("button", { name: "Create account and join" }).click();
    await expect.poll(() => page.getByTestId("active-role").textContent(), { timeout: 15000 }).toBe("mentor");
    expect(await page.getByTestId("active-shop").textContent()).toBe("Quillstone Foundry Lab");
    await shot(page, "phone-after-joining");
    await page.context().close();

    // Used once: the same link now says so, at both widths.
    for (const [name, size] of [
      ["phone", PHONE],
      ["wide", WIDE],
    ] as const) {
      const again = await (await browser().newContext({ viewport: size })).newPage();
      await again.goto(link.href);
      await seen(again, /already been used/);
      await shot(again, `${name}-invitation-used`);
      await again.context().close();
    }

    // The owner's record now shows the join.
    await owner.reload();
    await owner.getByRole("tab", { name: "More" }).click();
    await seen(owner, "Nell Ladle");
    expect(await owner.getByTestId("member-change").first().textContent()).toContain("joined");
    await owner.context().close();
  });
});

for (const [sizeName, size] of [
  ["phone", PHONE],
  ["wide", WIDE],
] as const) {
  describe(`people screens at ${sizeName} size (${size.width} px)`, () => {
    it("shows an unknown invitation link plainly, and the forgot-password answer", async () => {
      const page = await (await browser().newContext({ viewport: size })).newPage();
      await page.goto(`${baseUrl}/invitation/not-a-real-link`);
      await seen(page, /not known/);
      await shot(page, `${sizeName}-invitation-unknown`);
      await page.goto(`${baseUrl}/sign-in`);
      await expect.poll(() => page.getByText("Forgot your password?").count(), { timeout: 10000 }).toBe(1);
      await page.goto(`${baseUrl}/forgot-password`);
      await page.getByLabel("E-mail").fill(`nobody-${Date.now()}@test.example`);
      await page.getByRole("button", { name: "Send the link" }).click();
      await expect.poll(() => page.getByTestId("reset-sent").count(), { timeout: 10000 }).toBe(1);
      await shot(page, `${sizeName}-forgot-password`);
      await page.goto(`${baseUrl}/reset-password?token=made-up`);
      await page.getByLabel("New password").fill("another-long-one");
      await page.getByLabel("Repeat it").fill("another-long-one");
      await page.getByRole("button", { name: "Set password" }).click();
      await seen(page, /already been used or has run out/);
      await shot(page, `${sizeName}-reset-bad-link`);
      await page.context().close();
    });

    it("shows the owner's people section and the development inbox", async () => {
      const page = await signedInAs(browser(), baseUrl, size, "owner");
      await page.getByRole("tab", { name: "More" }).click();
      await seen(page, "Changes to people");
      await longShot(page, `${sizeName}-more-people`);
      await page.getByText(/Development inbox/).click();
      await seen(page, "Mail the local catcher received");
      await longShot(page, `${sizeName}-dev-inbox`);
      await page.context().close();
    });

    it("shows a caster the people without the owner's controls", async () => {
      const page = await signedInAs(browser(), baseUrl, size, "caster");
      await page.getByRole("tab", { name: "More" }).click();
      await seen(page, "Leave this shop");
      expect(await page.getByText("Invite someone").count()).toBe(0);
      expect(await page.getByRole("button", { name: "Change", exact: true }).count()).toBe(0);
      await page.context().close();
    });
  });
}
