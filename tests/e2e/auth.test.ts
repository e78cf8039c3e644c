import type { Page } from "playwright-core";
import { describe, expect, inject, it } from "vitest";
import { DEMO_PEOPLE } from "../../server/seed/demo-people";
import { PHONE, shot, signIn, useBrowser, WIDE } from "./browser";

const baseUrl = inject("baseUrl");
const browser = useBrowser();

const demo = (role: string) => DEMO_PEOPLE.find((p) => p.role === role)!;

async function newPage(size: { width: number; height: number }): Promise<Page> {
  const context = await browser().newContext({ viewport: size });
  return context.newPage();
}

for (const [sizeName, size] of [
  ["phone", PHONE],
  ["wide", WIDE],
] as const) {
  describe(`at ${sizeName} size (${size.width} px)`, () => {
    it("signs up a new person with a shop they own, then signs out", async () => {
      const page = await newPage(size);
      await page.goto(`${baseUrl}/sign-up`);
      await page.getByLabel("Your name").fill("Test Caster");
      await page.getByLabel("E-mail").fill(`new-${sizeName}-${Date.now()}@test.example`);
      await page.getByLabel("Password").fill("long-enough-pass");
      await page.getByLabel("Shop name").fill(`Bench Shop ${sizeName}`);
      await page.getByRole("button", { name: "Create account" }).click();
      await expect
        .poll(() => page.getByTestId("active-shop").textContent(), { timeout: 15000 })
        .toBe(`Bench Shop ${sizeName}`);
      expect(await page.getByTestId("active-role").textContent()).toBe("owner");
      await shot(page, `${sizeName}-after-sign-up`);
      await page.getByRole("button", { name: "Sign out" }).click();
      await expect.poll(() => page.getByRole("button", { name: "Sign in" }).count(), { timeout: 10000 }).toBe(1);
      await page.context().close();
    });

    it("tells someone signing up with a taken address to check that mailbox or sign in, and makes no shop", async () => {
      const page = await newPage(size);
      await page.goto(`${baseUrl}/sign-up`);
      await page.getByLabel("Your name").fill("Someone Else");
      await page.getByLabel("E-mail").fill(demo("caster").email);
      await page.getByLabel("Password").fill("brass-ladle-sprue-58");
      await page.getByLabel("Shop name").fill(`Copied Shop ${sizeName}`);
      await page.getByRole("button", { name: "Create account" }).click();
      const notice = page.getByTestId("sign-up-check-mail");
      await expect.poll(() => notice.count(), { timeout: 15000 }).toBe(1);
      expect(await notice.textContent()).toMatch(/already has an account, we have sent it a message/);
      await shot(page, `${sizeName}-sign-up-taken`);
      await notice.getByRole("link", { name: "sign in" }).click();
      await expect.poll(() => page.getByRole("button", { name: "Sign in" }).count(), { timeout: 10000 }).toBe(1);
      await page.context().close();
    });

    it("shows field messages for a malformed e-mail and a short password, and sends nothing", async () => {
      const page = await newPage(size);
      let authCalls = 0;
      page.on("request", (r) => r.url().includes("/api/auth/sign-up") && authCalls++);
      await page.goto(`${baseUrl}/sign-up`);
      await page.getByLabel("Your name").fill("Someone");
      await page.getByLabel("E-mail").fill("not-an-email");
      await page.getByLabel("Password").fill("short");
      await page.getByLabel("Shop name").fill("Some Shop");
      await page.getByRole("button", { name: "Create account" }).click();
      await expect.poll(() => page.getByText("Enter an e-mail address like name@example.com").count()).toBe(1);
      expect(await page.getByText("Use at least 10 characters for the password").count()).toBe(1);
      expect(authCalls).toBe(0);
      await shot(page, `${sizeName}-sign-up-errors`);
      await page.context().close();
    });

    it("says the same thing for a wrong password and an unknown e-mail", async () => {
      const page = await newPage(size);
      await signIn(page, baseUrl, demo("caster").email, "wrong-password-1");
      const message = page.getByText("That e-mail and password do not match an account.");
      await expect.poll(() => message.count(), { timeout: 10000 }).toBe(1);
      await shot(page, `${sizeName}-wrong-password`);
      await signIn(page, baseUrl, "nobody-here@test.example", "wrong-password-1");
      await expect.poll(() => message.count(), { timeout: 10000 }).toBe(1);
      await page.context().close();
    });

    for (const role of ["owner", "mentor", "caster"] as const) {
      it(`signs the demo ${role} in and shows their shop, role and navigation`, async () => {
        const page = await newPage(size);
        await signIn(page, baseUrl, demo(role).email, demo(role).password);
        await expect.poll(() => page.getByTestId("active-role").textContent(), { timeout: 15000 }).toBe(role);
        expect(await page.getByTestId("active-shop").textContent()).toBe("Quillstone Foundry Lab");
        for (const section of ["Casebook", "Melts", "Rulebook", "Trends", "More"]) {
          expect(await page.getByRole("tab", { name: section }).count()).toBe(1);
        }
        await page.getByRole("tab", { name: "More" }).click();
        await expect.poll(() => page.getByText("Shop defaults").count(), { timeout: 10000 }).toBe(1);
        const ownerOnly = await page.getByRole("button", { name: "Save defaults" }).count();
        expect(ownerOnly).toBe(role === "owner" ? 1 : 0);
        expect(await page.getByTestId("export-csv").count()).toBe(role === "owner" ? 1 : 0);
        await shot(page, `${sizeName}-${role}-more`);
        await page.context().close();
      });
    }

    it("lays out the navigation as a bottom bar on phones and a side rail when wide", async () => {
      const page = await newPage(size);
      await signIn(page, baseUrl, demo("caster").email, demo("caster").password);
      const tab = page.getByRole("tab", { name: "Casebook" });
      await expect.poll(() => tab.count(), { timeout: 15000 }).toBe(1);
      const box = (await tab.boundingBox())!;
      if (sizeName === "phone") expect(box.y).toBeGreaterThan(size.height - 100);
      else expect(box.x).toBeLessThan(220);
      await shot(page, `${sizeName}-casebook`);
      await page.context().close();
    });
  });
}
