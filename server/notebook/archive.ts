import { mayArchive, mayRestore } from "../../lib/archive-rules";
import type { ShopMember } from "../auth/shop-access";
import { forbidden, HttpError } from "../http/errors";

/** The archive rules of lib/archive-rules.ts as the answers a refused request gets. */
type ArchiveState = { createdBy: string; archivedAt: Date | null; archivedBy: string | null };

export function checkMayArchive(m: ShopMember, row: ArchiveState, what: string) {
  if (row.archivedAt) throw new HttpError(409, `This ${what} is already archived.`);
  if (!mayArchive(m, row))
    throw forbidden(`Only the person who logged this ${what}, a mentor or an owner may archive it.`);
}

export function checkMayRestore(m: ShopMember, row: ArchiveState, what: string) {
  if (!row.archivedAt) throw new HttpError(409, `This ${what} is not archived.`);
  if (!mayRestore(m, row)) throw forbidden(`Only a shop owner may bring back an archived ${what}.`);
}
