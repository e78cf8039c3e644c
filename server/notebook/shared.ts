import type { PersonRef } from "../../lib/notebook-schemas";
import { HttpError, notFound } from "../http/errors";

/**
 * Small pieces every notebook feature uses: ids from URLs, the author of a row, field errors
 * gathered from several checks.
 */

/** A serial id from a URL; anything else is a row that does not exist here (404, not 400). */
export function idParam(value: unknown, what = "Not found"): number {
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1 || n > 2_147_483_647 || String(n) !== String(value)) throw notFound(what);
  return n;
}

export const personRef = (id: string, name: string): PersonRef => ({ id, name });

/** Throws one 400 with every field problem found, so a form shows them all at once. */
export function refuseIfAny(...found: Record<string, string>[]) {
  const fields = Object.assign({}, ...found) as Record<string, string>;
  if (Object.keys(fields).length) throw new HttpError(400, "Some values need fixing.", fields);
}

/** Drops nulls so a stored row reads as an input (optional fields absent, never zero). */
export function withoutNulls<T extends Record<string, unknown>>(row: T): { [K in keyof T]?: Exclude<T[K], null> } {
  return Object.fromEntries(Object.entries(row).filter(([, v]) => v !== null)) as never;
}

/** The row without the columns a client never sees (shop id) or that are shaped separately. */
export function omit<T extends object, K extends keyof T>(row: T, keys: readonly K[]): Omit<T, K> {
  const out = { ...row };
  for (const k of keys) delete out[k];
  return out;
}

/** Keeps only the keys a schema knows, for building an update from a merged row. */
export function pick<T extends object, K extends keyof T>(row: T, keys: readonly K[]): Pick<T, K> {
  return Object.fromEntries(keys.map((k) => [k, row[k]])) as Pick<T, K>;
}

export const iso = (d: Date) => d.toISOString();

/** PostgreSQL's unique_violation, whether drizzle wrapped the driver's error or not. */
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; cause?: { code?: string } };
  return e?.code === "23505" || e?.cause?.code === "23505";
}

/** Rows grouped by a key, for joining child rows (marks, photos) onto a page of parents. */
export function groupBy<T, K>(rows: T[], key: (row: T) => K): Map<K, T[]> {
  const out = new Map<K, T[]>();
  for (const r of rows) out.set(key(r), [...(out.get(key(r)) ?? []), r]);
  return out;
}

/**
 * The columns a PATCH named, and no others: two people editing different fields of one row at the
 * same moment each write only their own, so neither overwrites the other's with what they read.
 * `alsoWhen` adds columns that move with a named one (alloy -> alloyId, photoId -> x and y).
 */
export function changedOnly<T extends object>(
  values: T,
  patch: object,
  alsoWhen: Record<string, readonly string[]> = {},
): Partial<T> {
  const named = new Set(Object.keys(patch).filter((k) => (patch as Record<string, unknown>)[k] !== undefined));
  for (const [key, extra] of Object.entries(alsoWhen)) if (named.has(key)) extra.forEach((k) => named.add(k));
  return Object.fromEntries(Object.entries(values).filter(([k]) => named.has(k))) as Partial<T>;
}
