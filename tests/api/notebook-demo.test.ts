import { rmSync } from "node:fs";
import { beforeAll, afterAll, describe, expect, it } from "vitest";
import { seedDemoNotebook } from "../../server/seed/seed-notebook";
import type { CastingDetail, CastingSummary, Page } from "../../lib/notebook-schemas";
import { env } from "../../server/env";
import { migrateOnce, shopWithCrew } from "./helpers";

beforeAll(migrateOnce);
afterAll(() => rmSync(env.UPLOAD_DIR, { recursive: true, force: true }));

describe("the demo notebook", () => {
  it("fills a shop with a dozen melts, about thirty castings, drawn photos, marks and diagnoses", async () => {
    const { shopId, owner, mentor, caster } = await shopWithCrew("Demo Notebook Shop");
    const crew = {
      owner: { id: owner.userId, name: "Owner" },
      mentor: { id: mentor.userId, name: "Mentor" },
      caster: { id: caster.userId, name: "Caster" },
    };
    await seedDemoNotebook(shopId, crew);

    const melts = await caster.agent.get("/api/melts?pageSize=100");
    expect(melts.body.items).toHaveLength(12);
    expect(melts.body.next).toBeNull();
    expect(new Set(melts.body.items.map((m: { process: string }) => m.process)).size).toBeGreaterThanOrEqual(5);
    const list: Page<CastingSummary> = (await caster.agent.get("/api/castings?pageSize=100")).body;
    expect(list.items.length).toBeGreaterThanOrEqual(28);
    expect(new Set(list.items.map((c) => c.alloy)).size).toBeGreaterThanOrEqual(4);

    const withPhoto = list.items.filter((c) => c.thumbUrl);
    expect(withPhoto.length).toBeGreaterThanOrEqual(6);
    expect((await caster.agent.get(withPhoto[0].thumbUrl!)).headers["content-type"]).toBe("image/jpeg");

    const details: CastingDetail[] = await Promise.all(
      list.items.map(async (c) => (await caster.agent.get(`/api/castings/${c.id}`)).body),
    );
    const diagnosed = details.filter((d) => d.diagnosis);
    expect(diagnosed.length).toBeGreaterThanOrEqual(4);
    // The demo's pour conditions point where foundry practice says they do.
    const topCause = (part: string, process: string) =>
      details.find((d) => d.partName === part && d.melt.process === process && d.diagnosis)?.diagnosis?.result.causes[0]
        .id;
    expect(topCause("Valve body", "green-sand")).toBe("hydrogen-pickup"); // humid day, mixed scrap, no degassing
    expect(topCause("Bench block", "no-bake-sand")).toBe("insufficient-feeding"); // 60 mm section, no riser
    const pinned = details.flatMap((d) => d.marks).filter((m) => m.photoId !== null);
    expect(pinned.length).toBeGreaterThanOrEqual(6);
    expect(pinned.every((m) => m.x !== null && m.y !== null)).toBe(true);

    // The learning loop has been run on a few cases, so the review, follow-ups and trends show something.
    const trends = (await mentor.agent.get("/api/trends")).body;
    expect(trends.confirmedCauses.map((c: { causeId: string }) => c.causeId)).toContain("cold-pour");
    const pourHotter = trends.fixes.find((f: { fix: string }) => f.fix.startsWith("Pour hotter"));
    expect(pourHotter).toMatchObject({ tried: 1, worked: 1 });
    const queue = (await mentor.agent.get("/api/review/queue")).body.items;
    expect(queue.map((q: { partName: string }) => q.partName)).toEqual(["Shelf bracket"]);
  });
});
