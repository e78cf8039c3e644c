import { inArray, or } from "drizzle-orm";
import { db } from "../db";
import { photos } from "../../db/schema";
import { env } from "../env";
import { deleteObjects, objectPages } from "./object-store";

export type SweepReport = { looked: number; removed: string[]; keptInGrace: number };

/**
 * Removes from the photo bucket every object that no photo row names (issue 9, item 11): what a server
 * killed between putting an upload's objects and committing its row leaves behind (server/photos/service.ts
 * puts both objects first, then writes the row). An object younger than the grace period is left alone,
 * since another server may be between those two steps right now; no row ever names an object older
 * than that which it did not name when it was put, so an old object no row names is unreachable.
 * The bucket is the product's own (S3_BUCKET holds photos and thumbnails only).
 * The bucket is walked a page at a time and each page's keys are looked up in one query.
 */
export async function sweepOrphanPhotos(
  opts: { graceMs?: number; pageSize?: number; log?: (line: string) => void; now?: Date } = {},
): Promise<SweepReport> {
  const graceMs = opts.graceMs ?? env.ORPHAN_PHOTO_GRACE_MINUTES * 60_000;
  const log = opts.log ?? ((line: string) => console.log(line));
  const cutoff = (opts.now ?? new Date()).getTime() - graceMs;
  const report: SweepReport = { looked: 0, removed: [], keptInGrace: 0 };
  for await (const page of objectPages(opts.pageSize)) {
    report.looked += page.length;
    const old = page.filter((o) => o.lastModified.getTime() <= cutoff).map((o) => o.key);
    report.keptInGrace += page.length - old.length;
    if (!old.length) continue;
    const named = await db
      .select({ fileName: photos.fileName, thumbName: photos.thumbName })
      .from(photos)
      .where(or(inArray(photos.fileName, old), inArray(photos.thumbName, old)));
    const inUse = new Set(named.flatMap((r) => [r.fileName, r.thumbName]));
    const orphans = old.filter((key) => !inUse.has(key));
    if (!orphans.length) continue;
    // A few at a time, so a page of orphans is not a thousand requests at once. A failed removal is
    // logged by deleteObjects and simply found again by the next sweep.
    for (let i = 0; i < orphans.length; i += 20) {
      const batch = orphans.slice(i, i + 20);
      if (!(await deleteObjects(batch))) continue;
      for (const key of batch) log(`Photo store: removed ${key} (no photo row names it)`);
      report.removed.push(...batch);
    }
  }
  log(
    `Photo store sweep: ${report.looked} object(s) looked at, ${report.removed.length} orphan(s) removed, ` +
      `${report.keptInGrace} younger than the grace period left alone.`,
  );
  return report;
}
