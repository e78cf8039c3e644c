import { roleCan } from "../../lib/permissions";
import type { ShopMember } from "../auth/shop-access";
import { forbidden, HttpError } from "../http/errors";

/**
 * Who may archive and bring back a melt or casting. Its author and mentors (and owners) archive;
 * an owner restores at any time; whoever archived it may undo that for a short while after, which is
 * what the "Undo" beside the notice does, so a slip of the finger costs nothing.
 */
export const UNDO_WINDOW_MS = 10 * 60_000;

type ArchiveState = { createdBy: string; archivedAt: Date | null; archivedBy: string | null };

export function checkMayArchive(m: ShopMember, row: ArchiveState, what: string) {
  if (row.archivedAt) throw new HttpError(409, `This ${what} is already archived.`);
  if (row.createdBy !== m.userId && !roleCan(m.role, { casebook: ["archive-any"] }))
    throw forbidden(`Only the person who logged this ${what}, a mentor or an owner may archive it.`);
}

export function checkMayRestore(m: ShopMember, row: ArchiveState, what: string, now = Date.now()) {
  if (!row.archivedAt) throw new HttpError(409, `This ${what} is not archived.`);
  if (roleCan(m.role, { casebook: ["restore"] })) return;
  const ownUndo = row.archivedBy === m.userId && now - row.archivedAt.getTime() <= UNDO_WINDOW_MS;
  if (!ownUndo) throw forbidden(`Only a shop owner may bring back an archived ${what}.`);
}
