import type { RuleRow } from "./rulebook-schemas";

/** A rule's state in a word or two: a draft over a published version leaves that version in use. */
export function stateWords(r: Pick<RuleRow, "status" | "inUse" | "switchedOff">): string {
  if (r.switchedOff) return "switched off here";
  if (r.status === "draft") return r.inUse ? "in use, changes not published" : "draft";
  return { "built-in": "built in", published: "in use", retired: "retired" }[r.status];
}
