import { and, eq, inArray } from "drizzle-orm";
import { db } from "../db";
import { castings, importedRows, melts } from "../../db/schema";
import {
  guessMapping,
  importMapping,
  type ImportMapping,
  type ImportPreview,
  type ImportResult,
  type RowStatus,
} from "../../lib/import-fields";
import {
  alloyConflicts,
  castingFields,
  meltFields,
  type CastingInput,
  type MeltInput,
} from "../../lib/notebook-schemas";
import { findAlloy } from "../alloys/service";
import type { ShopMember } from "../auth/shop-access";
import { HttpError } from "../http/errors";
import { readCsv } from "./parse";
import { readRow, type ReadRow } from "./rows";

type Checked = { row: ReadRow; status: RowStatus; alloyId?: number };

/** Each row read and checked, the alloy against the shop's table, the fingerprint against past imports. */
async function checkRows(shopId: string, rows: string[][], mapping: ImportMapping): Promise<Checked[]> {
  // Line numbers as a spreadsheet shows them: the header is line 1.
  const read = rows.map((cells, i) => readRow(cells, i + 2, mapping));
  const alloyOf = new Map<string, Awaited<ReturnType<typeof findAlloy>>>();
  for (const r of read)
    if (r.ok && !alloyOf.has(r.melt.alloy)) alloyOf.set(r.melt.alloy, await findAlloy(shopId, r.melt.alloy));
  const prints = read.flatMap((r) => (r.ok ? [r.fingerprint] : []));
  const done = new Set(
    prints.length
      ? (
          await db
            .select({ f: importedRows.fingerprint })
            .from(importedRows)
            .where(and(eq(importedRows.shopId, shopId), inArray(importedRows.fingerprint, prints)))
        ).map((x) => x.f)
      : [],
  );
  const seen = new Set<string>();
  return read.map((row): Checked => {
    if (!row.ok) return { row, status: "refused" };
    const { alloy, accepted } = alloyOf.get(row.melt.alloy)!;
    if (!alloy) {
      const problems = { Alloy: `"${row.melt.alloy}" is not in the alloy table (${accepted.join(", ")})` };
      return { row: { line: row.line, ok: false, problems }, status: "refused" };
    }
    const conflicts = alloyConflicts(row.melt, alloy);
    if (Object.keys(conflicts).length) {
      const problems = Object.fromEntries(
        Object.entries(conflicts).map(([k, v]) => [k === "pourTempC" ? "Pour temperature" : "Hottest the melt got", v]),
      );
      return { row: { line: row.line, ok: false, problems }, status: "refused" };
    }
    if (done.has(row.fingerprint)) return { row, status: "already-imported" };
    if (seen.has(row.fingerprint)) return { row, status: "repeated-in-file" };
    seen.add(row.fingerprint);
    return { row, status: "new", alloyId: alloy.id };
  });
}

const counted = (checked: Checked[]) => {
  const counts: Record<RowStatus, number> = { new: 0, "already-imported": 0, "repeated-in-file": 0, refused: 0 };
  for (const c of checked) counts[c.status]++;
  return counts;
};

/** What an import of this file with this mapping would do, row by row; nothing is stored. */
export async function previewImport(shopId: string, bytes: Buffer, mapping: unknown): Promise<ImportPreview> {
  const { headers, rows } = readCsv(bytes);
  const wanted = mapping === undefined ? guessMapping(headers) : mapping;
  const parsed = importMapping.safeParse(wanted);
  if (!parsed.success) {
    const mappingProblems = parsed.error.issues.map((i) => i.message);
    const guess = Array.isArray(wanted) ? (wanted as ImportMapping) : guessMapping(headers);
    return { headers, sample: rows[0], mapping: guess, mappingProblems, rows: [], counts: counted([]) };
  }
  const checked = await checkRows(shopId, rows, parsed.data);
  return {
    headers,
    sample: rows[0],
    mapping: parsed.data,
    mappingProblems: [],
    counts: counted(checked),
    rows: checked.map(({ row, status }) => ({
      line: row.line,
      status,
      partName: row.ok ? row.casting.partName : null,
      pouredOn: row.ok ? row.melt.pouredOn : null,
      problems: row.ok ? {} : row.problems,
    })),
  };
}

const MELT_COLUMNS = Object.keys(meltFields.shape).filter((k) => k !== "alloy") as Exclude<keyof MeltInput, "alloy">[];
const CASTING_COLUMNS = Object.keys(castingFields.shape) as (keyof typeof castingFields.shape)[];
const pick = <T extends object>(input: T, keys: readonly string[]) =>
  Object.fromEntries(keys.map((k) => [k, (input as Record<string, unknown>)[k] ?? null]));

/**
 * The new rows in one transaction: all of them or none. Rows with the same melt conditions share one melt.
 * The fingerprint goes in first; a row another import took meanwhile conflicts on the unique index and is skipped.
 */
export async function runImport(m: ShopMember, bytes: Buffer, mapping: unknown): Promise<ImportResult> {
  const { rows } = readCsv(bytes);
  const parsed = importMapping.safeParse(mapping);
  if (!parsed.success)
    throw new HttpError(400, "The column mapping needs fixing.", {
      mapping: parsed.error.issues.map((i) => i.message).join("; "),
    });
  const checked = await checkRows(m.shopId, rows, parsed.data);
  const counts = counted(checked);
  let imported = 0;
  const meltIds = new Map<string, number>();
  await db.transaction(async (tx) => {
    for (const c of checked) {
      if (c.status !== "new" || !c.row.ok) continue;
      const { melt, casting, fingerprint } = c.row;
      const [taken] = await tx
        .insert(importedRows)
        .values({ shopId: m.shopId, fingerprint, createdBy: m.userId })
        .onConflictDoNothing()
        .returning({ id: importedRows.id });
      if (!taken) continue;
      const meltKey = JSON.stringify(pick(melt, [...MELT_COLUMNS, "alloy"]));
      let meltId = meltIds.get(meltKey);
      if (meltId === undefined) {
        const values = pick(melt, MELT_COLUMNS) as Omit<typeof melts.$inferInsert, "shopId" | "createdBy" | "alloyId">;
        const [row] = await tx
          .insert(melts)
          .values({ ...values, alloyId: c.alloyId!, shopId: m.shopId, createdBy: m.userId })
          .returning({ id: melts.id });
        meltIds.set(meltKey, (meltId = row.id));
      }
      const values = pick(casting as CastingInput, CASTING_COLUMNS) as Omit<
        typeof castings.$inferInsert,
        "shopId" | "meltId" | "createdBy"
      >;
      const [row] = await tx
        .insert(castings)
        .values({ ...values, meltId, shopId: m.shopId, createdBy: m.userId })
        .returning({ id: castings.id });
      await tx.update(importedRows).set({ castingId: row.id }).where(eq(importedRows.id, taken.id));
      imported++;
    }
  });
  const refused = checked
    .filter((c) => c.status === "refused")
    .map(({ row }) => ({
      line: row.line,
      status: "refused" as const,
      partName: null,
      pouredOn: null,
      problems: row.ok ? {} : row.problems,
    }));
  return { imported, melts: meltIds.size, counts, refused };
}
