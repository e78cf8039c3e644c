import { conditionLeaves, type KbRule } from "./kb-schema";
import { describeLeaf, siFormat, valueWord, type ValueFormat } from "./rule-words";

/**
 * What changed between two versions of a shop rule, as sentences a mentor reads in the version list.
 */
export const RULE_STATUSES = ["draft", "published", "retired"] as const;
export type RuleStatus = (typeof RULE_STATUSES)[number];
export type VersionLike = { rule: KbRule; status: RuleStatus };

export type DiffWords = {
  fmt?: ValueFormat;
  causeTitle?: (id: string) => string;
  defectLabel?: (type: string) => string;
  locationLabel?: (location: string) => string;
};

const STATUS_CHANGE: Record<string, string> = {
  "draft>published": "Published: now used in every diagnosis here",
  "published>retired": "Retired: no longer used",
  "draft>retired": "Retired before it was published",
  "published>draft": "Changed; the published version stays in use until this one is published",
  "retired>draft": "Taken up again as a draft",
  "retired>published": "Published again",
};

const added = (before: string[], after: string[]) => after.filter((x) => !before.includes(x));
const quote = (s: string) => `“${s}”`;

export function ruleChanges(before: VersionLike | null, after: VersionLike, words: DiffWords = {}): string[] {
  const fmt = words.fmt ?? siFormat;
  const cause = words.causeTitle ?? valueWord;
  const defect = words.defectLabel ?? valueWord;
  const place = words.locationLabel ?? valueWord;
  const a = after.rule;
  if (!before) return [`Written as a ${after.status === "draft" ? "draft" : after.status} rule`];
  const b = before.rule;
  const out: string[] = [];
  if (before.status !== after.status)
    out.push(STATUS_CHANGE[`${before.status}>${after.status}`] ?? `Now ${after.status}`);

  const types = (r: KbRule) => r.explains.map((e) => e.type);
  for (const t of added(types(b), types(a))) out.push(`Now also explains ${defect(t)}`);
  for (const t of added(types(a), types(b))) out.push(`No longer explains ${defect(t)}`);
  const places = (r: KbRule) => [...new Set(r.explains.flatMap((e) => e.locations ?? []))];
  const [pb, pa] = [places(b), places(a)];
  if (pb.join() !== pa.join())
    out.push(
      `Where on the part: ${pb.length ? pb.map(place).join(", ") : "anywhere"} → ${pa.length ? pa.map(place).join(", ") : "anywhere"}`,
    );

  const conds = (r: KbRule) => conditionLeaves(r.conditions).map((l) => describeLeaf(l, fmt));
  for (const c of added(conds(b), conds(a))) out.push(`Condition added: ${c}`);
  for (const c of added(conds(a), conds(b))) out.push(`Condition removed: ${c}`);

  if (b.cause !== a.cause) out.push(`Cause: ${cause(b.cause)} → ${cause(a.cause)}`);
  if (b.effect !== a.effect)
    out.push(a.effect === "weakens" ? "Now speaks against the cause" : "Now points to the cause");
  if (b.weight !== a.weight) out.push(`Weight: ${b.weight} → ${a.weight}`);
  if (b.because !== a.because) out.push(`Reason: ${quote(b.because)} → ${quote(a.because)}`);
  for (const s of added(b.sources, a.sources)) out.push(`Source added: ${s}`);
  for (const s of added(a.sources, b.sources)) out.push(`Source removed: ${s}`);
  if (out.length === 0) out.push("Saved again with no change");
  return out;
}
