import { readFile, rm, stat } from "node:fs/promises";
import { join, resolve } from "node:path";
import { asc } from "drizzle-orm";
import { db } from "../db";
import { photos } from "../../db/schema";
import { env } from "../env";
import { objectExists, putObject } from "./object-store";

export type MoveReport = { moved: string[]; alreadyInStore: string[]; missing: string[] };

const onDisk = (path: string) =>
  stat(path).then(
    (s) => s.isFile(),
    () => false,
  );

/**
 * The one-time move of photos from the server's disk (the old layout: UPLOAD_DIR/<name>.jpg, one file
 * per object, named as in the row) into the object store, under the same names, so no row changes.
 * A file is removed from the disk only once the store holds it, so an interrupted run loses nothing and
 * running it again finishes the job: a file whose object is already there is simply removed.
 */
export async function movePhotosToObjectStore(log: (line: string) => void = () => {}): Promise<MoveReport> {
  const dir = resolve(env.UPLOAD_DIR);
  const report: MoveReport = { moved: [], alreadyInStore: [], missing: [] };
  const rows = await db
    .select({ id: photos.id, fileName: photos.fileName, thumbName: photos.thumbName })
    .from(photos)
    .orderBy(asc(photos.id));
  for (const row of rows) {
    for (const name of [row.fileName, row.thumbName]) {
      const path = join(dir, name);
      const file = await onDisk(path);
      const stored = await objectExists(name);
      if (file && !stored) {
        await putObject(name, await readFile(path), "image/jpeg");
        report.moved.push(name);
        log(`moved   photo ${row.id}: ${name}`);
      } else if (stored) {
        report.alreadyInStore.push(name);
      } else {
        report.missing.push(name);
        log(`missing photo ${row.id}: ${name} is neither on disk nor in the store`);
      }
      if (file) await rm(path);
    }
  }
  return report;
}
