import type { Request, Response } from "express";
import { HttpError } from "./errors";

/**
 * Optimistic concurrency for edits: GET of one row answers an ETag (the row's version column, see
 * db/notebook-schema.ts rowVersionColumn), and a PATCH that sends it back in If-Match is saved only if
 * the row is still at that version. A PATCH without If-Match (scripts, older clients) saves as before.
 */
export type Versioned = { version: number };

export const STALE_MESSAGE = "Changed by someone else since you opened it";

/** A strong validator: the same version always means the same stored row. */
export const rowVersion = (row: Versioned) => `"${row.version}"`;

export function sendVersioned<T extends Versioned>(res: Response, row: T, status = 200) {
  res.set("ETag", rowVersion(row)).status(status).json(row);
}

/**
 * The version the person opened, from If-Match, or undefined when none was sent. A header that names
 * no version we could have given ("*" aside, which matches any) can never match, so it answers 412 as a
 * stale one would, with the current row, rather than being ignored.
 */
export function expectedVersion(req: Request): number | "unmatchable" | undefined {
  const header = req.get("If-Match");
  if (header === undefined || header.trim() === "*") return undefined;
  const match = /^\s*"(\d{1,9})"\s*$/.exec(header);
  return match ? Number(match[1]) : "unmatchable";
}

export class StaleRowError extends HttpError {
  constructor(readonly current: Versioned) {
    super(412, STALE_MESSAGE);
  }
}

/**
 * Refuses the edit when the row moved on since the person opened it. The caller's UPDATE must also
 * carry `version = expected` in its WHERE (see versionGuard) so two PATCHes with the same If-Match
 * cannot both pass this check and both write.
 */
export function requireFresh(expected: number | "unmatchable" | undefined, current: Versioned) {
  if (expected !== undefined && expected !== current.version) throw new StaleRowError(current);
}
