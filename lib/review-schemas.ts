import { z } from "zod";
import { fixesTried } from "../db/mentor-schema";
import { WORKED, type Worked } from "../rules/outcomes";
import type { DefectType, Process } from "../rules/case";
import type { CauseRecord } from "../rules/calibration";
import type { RankedCause } from "../rules/rank";
import { requiredText, rowId, text } from "./fields";
import { tableInput } from "./table-schemas";
import type { Outcome, PersonRef } from "./notebook-schemas";
import type { CauseOption } from "./rulebook-schemas";

/**
 * Review, confirmed causes and follow-ups (core loop step 5): inputs for the casting-page panels
 * and the review queue, shared by the forms and the API.
 */
const note = (max: number) => text(max).optional();

// Written out, not built from review_requests: its note column is nullable, and tableInput would let a
// request send `note: null`, which the API has never accepted; the note is the request's only field.
export const reviewRequestInput = z.object({ note: note(1000) });

/**
 * A mentor confirms a cause of the rulebook (causeId) or names another (causeText), with a note. A named
 * cause can be added to the shop's rulebook at once (`makeShopCause`, with the fix to try for it), so
 * later rules can point at it and its record is kept.
 */
export const confirmationInput = z
  .object({
    causeId: requiredText("choose a cause", 100).optional(),
    causeText: text(200).optional(),
    makeShopCause: z.boolean({ error: "true or false" }).optional(),
    newCauseFix: text(300).optional(),
    note: note(2000),
  })
  .superRefine((c, ctx) => {
    if (c.makeShopCause && !c.causeText)
      ctx.addIssue({ code: "custom", path: ["causeText"], message: "name the cause to add it" });
    if (c.makeShopCause && !c.newCauseFix)
      ctx.addIssue({ code: "custom", path: ["newCauseFix"], message: "give one fix to try for it" });
    if (!c.causeId && !c.causeText)
      ctx.addIssue({ code: "custom", path: ["causeId"], message: "choose a cause, or name another" });
    if (c.causeId && c.causeText)
      ctx.addIssue({
        code: "custom",
        path: ["causeText"],
        message: "either a cause from the list or another, not both",
      });
  });
export type ConfirmationInput = z.infer<typeof confirmationInput>;

export { WORKED, type Worked };
export const WORKED_LABELS: Record<Worked, string> = { yes: "it worked", partly: "partly", no: "it did not work" };

/** A fix is tried after the casting in the URL; nextCastingId links the casting that shows whether it worked. */
const fixFields = tableInput(
  fixesTried,
  {
    // Room for several of the rulebook's fixes chosen together (the longest is about 200 characters).
    fix: requiredText("say what was changed", 2000),
    nextCastingId: rowId("must be the id of a casting"),
    worked: z.enum(WORKED, { error: "yes, partly or no" }),
  },
  ["castingId"],
);
/** Whether a fix worked is read off the next casting, so it needs one linked. */
const workedNeedsNext = (f: { nextCastingId?: number | null; worked?: Worked | null }, ctx: z.RefinementCtx) => {
  if (f.worked && !f.nextCastingId)
    ctx.addIssue({ code: "custom", path: ["worked"], message: "link the next casting first" });
};
export const fixInput = fixFields.superRefine(workedNeedsNext);
export const fixPatch = fixFields.partial();
/** Ticking a fix to try on a casting's likely causes (or taking the tick off). */
export const fixTickInput = z.object({
  fix: requiredText("say which fix", 500),
  ticked: z.boolean({ error: "true or false" }),
});
export type FixTickInput = z.infer<typeof fixTickInput>;
export type FixInput = z.infer<typeof fixInput>;
export type FixPatch = z.infer<typeof fixPatch>;

// ---- Answers ----
export type ReviewRequest = {
  id: number;
  castingId: number;
  note: string | null;
  createdBy: PersonRef | null;
  createdAt: string;
  answeredAt: string | null;
};
export type Confirmation = {
  id: number;
  castingId: number;
  causeId: string | null;
  causeTitle: string;
  note: string | null;
  createdBy: PersonRef | null;
  createdAt: string;
};
export type CaseReview = {
  waiting: ReviewRequest | null;
  requests: ReviewRequest[];
  current: Confirmation | null;
  confirmations: Confirmation[];
};
export type QueueItem = {
  requestId: number;
  castingId: number;
  meltId: number;
  partName: string;
  pouredOn: string;
  alloy: string;
  process: Process;
  defectTypes: DefectType[];
  note: string | null;
  askedBy: PersonRef | null;
  askedAt: string;
  topCause: { id: string; title: string; score: number } | null;
};
export type CastingRef = { id: number; meltId: number; partName: string; pouredOn: string; outcome: Outcome | null };
export type FixTried = {
  id: number;
  castingId: number;
  fix: string;
  next: CastingRef | null;
  worked: Worked | null;
  createdBy: PersonRef | null;
  createdAt: string;
  updatedAt: string;
  version: number;
};
/** One casting of the part in the chain of fixes, oldest first; `current` marks the casting on screen. */
export type ChainLink = { casting: CastingRef; fixes: FixTried[]; current: boolean };
/** `ticked`: the fixes to try ticked on this casting's likely causes. */
export type Followups = { fixes: FixTried[]; chain: ChainLink[]; candidates: CastingRef[]; ticked: string[] };

/** Every cause of the shop's rulebook, with its fixes for this casting's metal: what a mentor may confirm. */
export type CastingCauses = { causes: CauseOption[] };

/** A ranked cause as the shop's diagnosis returns it: with its record among confirmed cases here. */
export type CauseWithRecord = RankedCause & { record?: CauseRecord | null };
/** "right in 7 of 9 confirmed cases here", or null with no confirmed case yet. */
export const recordWords = (r: CauseRecord | null | undefined) =>
  r && r.confirmed > 0
    ? `right in ${r.right} of ${r.confirmed} confirmed case${r.confirmed === 1 ? "" : "s"} here`
    : null;
