import { and, asc, desc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "../db";
import {
  alloys,
  answerSeen,
  castings,
  confirmations,
  defectMarks,
  diagnosisSnapshots,
  melts,
  reviewRequests,
  shopCauses,
  user,
} from "../../db/schema";
import type {
  CaseReview,
  CastingCauses,
  Confirmation,
  ConfirmationInput,
  QueueItem,
  ReviewRequest,
} from "../../lib/review-schemas";
import { metalOf } from "../../rules/alloys";
import { comparableCause } from "../../rules/backtest";
import type { DiagnosisResult } from "../../rules/engine";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import type { KbCause } from "../../rules/kb-schema";
import { siText } from "../../rules/quantity-text";
import { fixesFor } from "../../rules/rank";
import type { ShopMember } from "../auth/shop-access";
import { castingInShop } from "../castings/lookup";
import { HttpError } from "../http/errors";
import { iso, personRef } from "../notebook/shared";
import { allCausesOf, causeTitles } from "../rulebook/cause-titles";
import { calibrateCasting, causesOf } from "../rulebook/context";
import { newCauseId } from "../rulebook/draft";

/** Review: a caster asks, the case waits in the mentors' queue (oldest first), a mentor confirms its cause. */
type RequestRow = typeof reviewRequests.$inferSelect;
type ConfirmationRow = typeof confirmations.$inferSelect;

async function nameOf(ids: (string | null)[]) {
  const wanted = [...new Set(ids.filter((x): x is string => !!x))];
  const rows = wanted.length
    ? await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, wanted))
    : [];
  return (id: string | null) => (id ? personRef(id, rows.find((r) => r.id === id)?.name ?? "") : null);
}

/** The metal of a casting's melt (from the alloy row it points at): fixes differ by metal. */
async function metalOfCasting(meltId: number) {
  const [row] = await db
    .select({ family: alloys.family })
    .from(melts)
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .where(eq(melts.id, meltId));
  return metalOf(row.family);
}

/** Every built-in and shop cause, with the fixes that apply to this casting's metal. */
export async function castingCauses(shopId: string, castingId: number): Promise<CastingCauses> {
  const casting = await castingInShop(shopId, castingId);
  const [metal, own] = await Promise.all([metalOfCasting(casting.meltId), causesOf(shopId)]);
  const facts = { metal };
  // Fixes in SI words, and as templates with quantities for the app to say in a person's units.
  const option = (c: KbCause, shop: boolean) => {
    const fixTemplates = fixesFor(c, facts);
    return { id: c.id, title: c.title, fixes: fixTemplates.map(siText), fixTemplates, shop };
  };
  return {
    causes: [...BUILT_IN_RULE_SET.causes.map((c) => option(c, false)), ...own.map((c) => option(c, true))],
  };
}

/**
 * What a confirmation stores as its cause: the chosen id; or, for words that are the title of a cause
 * already in the rulebook, that cause; or, when asked, a new shop cause named by the words; else the words.
 */
async function causeOfConfirmation(m: ShopMember, input: ConfirmationInput) {
  const known = await allCausesOf(m.shopId);
  if (input.causeId) {
    if (!known.some((c) => c.id === input.causeId))
      throw new HttpError(400, "Some values need fixing.", {
        causeId: "not a cause in this rulebook: choose one, or name another",
      });
    return { causeId: input.causeId, causeText: null, newCause: null };
  }
  const text = input.causeText ?? "";
  const named = comparableCause({ causeId: null, causeText: text }, known);
  if (named) return { causeId: named, causeText: null, newCause: null };
  if (!input.makeShopCause) return { causeId: null, causeText: text, newCause: null };
  const id = newCauseId(text, known);
  return { causeId: id, causeText: null, newCause: { id, title: text, fixes: [input.newCauseFix ?? ""] } };
}

export async function caseReview(shopId: string, castingId: number): Promise<CaseReview> {
  await castingInShop(shopId, castingId);
  const [reqs, confs, titles] = await Promise.all([
    db
      .select()
      .from(reviewRequests)
      .where(and(eq(reviewRequests.shopId, shopId), eq(reviewRequests.castingId, castingId)))
      .orderBy(desc(reviewRequests.id)),
    db
      .select()
      .from(confirmations)
      .where(and(eq(confirmations.shopId, shopId), eq(confirmations.castingId, castingId)))
      .orderBy(desc(confirmations.id)),
    causeTitles(shopId),
  ]);
  const who = await nameOf([...reqs.map((r) => r.createdBy), ...confs.map((c) => c.createdBy)]);
  const toRequest = (r: RequestRow): ReviewRequest => ({
    id: r.id,
    castingId: r.castingId,
    note: r.note,
    createdBy: who(r.createdBy),
    createdAt: iso(r.createdAt),
    answeredAt: r.answeredAt ? iso(r.answeredAt) : null,
  });
  const toConfirmation = (c: ConfirmationRow): Confirmation => ({
    id: c.id,
    castingId: c.castingId,
    causeId: c.causeId,
    note: c.note,
    createdBy: who(c.createdBy),
    createdAt: iso(c.createdAt),
    causeTitle: c.causeId ? (titles.get(c.causeId) ?? c.causeId) : (c.causeText ?? ""),
  });
  const requests = reqs.map(toRequest);
  const list = confs.map(toConfirmation);
  return {
    waiting: requests.find((r) => !r.answeredAt) ?? null,
    requests,
    current: list[0] ?? null,
    confirmations: list,
  };
}

/** Asking twice while a request is open keeps the first: the queue holds each casting once. */
/** Records that the person read the mentors' answer on this casting now (one row per person and casting). */
export async function markAnswerSeen(m: ShopMember, castingId: number): Promise<void> {
  await castingInShop(m.shopId, castingId);
  const seenAt = new Date();
  await db
    .insert(answerSeen)
    .values({ shopId: m.shopId, castingId, userId: m.userId, seenAt })
    .onConflictDoUpdate({ target: [answerSeen.castingId, answerSeen.userId], set: { seenAt } });
}

export async function requestReview(
  m: ShopMember,
  castingId: number,
  note?: string,
): Promise<{ created: boolean; review: CaseReview }> {
  await castingInShop(m.shopId, castingId);
  // The partial unique index keeps one open request per casting; a second click gets the open one.
  const inserted = await db
    .insert(reviewRequests)
    .values({ shopId: m.shopId, castingId, note: note || null, createdBy: m.userId })
    .onConflictDoNothing({ target: reviewRequests.castingId, where: isNull(reviewRequests.answeredAt) })
    .returning({ id: reviewRequests.id });
  const created = inserted.length > 0;
  return { created, review: await caseReview(m.shopId, castingId) };
}

export async function confirmCause(m: ShopMember, castingId: number, input: ConfirmationInput): Promise<CaseReview> {
  await castingInShop(m.shopId, castingId);
  const { causeId, causeText, newCause } = await causeOfConfirmation(m, input);
  await db.transaction(async (tx) => {
    if (newCause)
      await tx
        .insert(shopCauses)
        .values({
          shopId: m.shopId,
          causeId: newCause.id,
          title: newCause.title,
          fixes: newCause.fixes,
          createdBy: m.userId,
        })
        // The same words added twice at once: the first stores the cause, both confirm it.
        .onConflictDoNothing();
    await tx.insert(confirmations).values({
      shopId: m.shopId,
      castingId,
      causeId,
      causeText,
      note: input.note || null,
      createdBy: m.userId,
    });
    await tx
      .update(reviewRequests)
      .set({ answeredAt: new Date(), answeredBy: m.userId })
      .where(
        and(
          eq(reviewRequests.shopId, m.shopId),
          eq(reviewRequests.castingId, castingId),
          isNull(reviewRequests.answeredAt),
        ),
      );
  });
  // The confirmed casting's calibration row was marked changed in that transaction: work out that one
  // row now (server/rulebook/calibration.ts), between two batches of any rebuild of the shop under way,
  // so the next diagnosis finds it done without this request waiting for the whole shop.
  await calibrateCasting(m.shopId, castingId).catch((err) =>
    console.error("calibration after a confirmation failed", err),
  );
  return caseReview(m.shopId, castingId);
}

/** Cases waiting for a mentor, oldest request first, each with its defects and the top cause last diagnosed. */
export async function reviewQueue(shopId: string): Promise<QueueItem[]> {
  const rows = await db
    .select({
      r: reviewRequests,
      partName: castings.partName,
      meltId: castings.meltId,
      pouredOn: melts.pouredOn,
      process: melts.process,
      alloy: alloys.designation,
    })
    .from(reviewRequests)
    .innerJoin(castings, eq(castings.id, reviewRequests.castingId))
    .innerJoin(melts, eq(melts.id, castings.meltId))
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .where(and(eq(reviewRequests.shopId, shopId), isNull(reviewRequests.answeredAt)))
    .orderBy(asc(reviewRequests.createdAt), asc(reviewRequests.id))
    .limit(200);
  const ids = rows.map((r) => r.r.castingId);
  const [marks, snaps, who] = await Promise.all([
    ids.length
      ? db
          .select({ castingId: defectMarks.castingId, type: defectMarks.type })
          .from(defectMarks)
          .where(inArray(defectMarks.castingId, ids))
      : [],
    ids.length
      ? db
          .selectDistinctOn([diagnosisSnapshots.castingId], {
            castingId: diagnosisSnapshots.castingId,
            result: diagnosisSnapshots.result,
          })
          .from(diagnosisSnapshots)
          .where(inArray(diagnosisSnapshots.castingId, ids))
          .orderBy(diagnosisSnapshots.castingId, desc(diagnosisSnapshots.createdAt), desc(diagnosisSnapshots.id))
      : [],
    nameOf(rows.map((r) => r.r.createdBy)),
  ]);
  return rows.map(({ r, partName, meltId, pouredOn, process, alloy }) => {
    const top = (snaps.find((s) => s.castingId === r.castingId)?.result as DiagnosisResult | undefined)?.causes[0];
    return {
      requestId: r.id,
      castingId: r.castingId,
      meltId,
      partName,
      pouredOn,
      alloy,
      process: process,
      defectTypes: [...new Set(marks.filter((mk) => mk.castingId === r.castingId).map((mk) => mk.type))],
      note: r.note,
      askedBy: who(r.createdBy),
      askedAt: iso(r.createdAt),
      topCause: top ? { id: top.id, title: top.title, score: top.score } : null,
    };
  });
}
