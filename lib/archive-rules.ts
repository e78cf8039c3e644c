import { roleCan } from "./permissions";

/**
 * Who may archive and bring back a melt or casting, for the server and the app alike. Its author and
 * mentors (and owners) archive; an owner restores at any time; whoever archived it may undo that for
 * a short while after (the "Undo" beside the notice), so a slip of the finger costs nothing.
 */
export const UNDO_WINDOW_MS = 10 * 60_000;

type Who = { role: string; userId: string };
/** Dates as the server holds them or as ISO strings from an answer. */
type ArchiveState = { createdBy: string; archivedAt: Date | string | null; archivedBy: string | null };

export const mayArchive = (who: Who, row: ArchiveState) =>
  !row.archivedAt &&
  roleCan(who.role, { casebook: ["write"] }) &&
  (row.createdBy === who.userId || roleCan(who.role, { casebook: ["archive-any"] }));

/** The archiver's own undo, within the window. */
export const mayUndoArchive = (who: Who, row: ArchiveState, now = Date.now()) =>
  !!row.archivedAt && row.archivedBy === who.userId && now - new Date(row.archivedAt).getTime() <= UNDO_WINDOW_MS;

export const mayRestore = (who: Who, row: ArchiveState, now = Date.now()) =>
  !!row.archivedAt && (roleCan(who.role, { casebook: ["restore"] }) || mayUndoArchive(who, row, now));
