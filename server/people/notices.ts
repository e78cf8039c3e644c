import { and, eq, inArray, isNull, ne, or } from "drizzle-orm";
import { db } from "../db";
import { castings, member, noticeSettings, organization, reviewRequests, user } from "../../db/schema";
import type { NoticeSettings } from "../../lib/people-schemas";
import { env } from "../env";
import { causeConfirmedMail, reviewRequestedMail } from "../mail/messages";
import { sendMail } from "../mail/send";

/**
 * E-mail notices of the review loop. Called after the change is saved; a notice that cannot be
 * made or sent is logged and never fails the request that caused it.
 */
const ALL_ON: NoticeSettings = { reviewRequested: true, causeConfirmed: true };

export async function noticeSettingsOf(userId: string): Promise<NoticeSettings> {
  const [row] = await db.select().from(noticeSettings).where(eq(noticeSettings.userId, userId));
  return row ? { reviewRequested: row.reviewRequested, causeConfirmed: row.causeConfirmed } : ALL_ON;
}

export async function saveNoticeSettings(userId: string, settings: NoticeSettings) {
  const values = { ...settings, updatedAt: new Date() };
  await db
    .insert(noticeSettings)
    .values({ userId, ...values })
    .onConflictDoUpdate({ target: noticeSettings.userId, set: values });
  return settings;
}

const castingLink = (meltId: number, castingId: number) => `${env.PUBLIC_URL}/melts/${meltId}/castings/${castingId}`;

async function castingFacts(shopId: string, castingId: number) {
  const [row] = await db
    .select({
      partName: castings.partName,
      meltId: castings.meltId,
      createdBy: castings.createdBy,
      shopName: organization.name,
    })
    .from(castings)
    .innerJoin(organization, eq(organization.id, castings.shopId))
    .where(and(eq(castings.shopId, shopId), eq(castings.id, castingId)));
  return row;
}

/** Whether `kind` is on for each of these people (no row: on). */
async function wanting(userIds: string[], kind: keyof NoticeSettings) {
  if (!userIds.length) return [];
  const rows = await db.select().from(noticeSettings).where(inArray(noticeSettings.userId, userIds));
  return userIds.filter((id) => rows.find((r) => r.userId === id)?.[kind] ?? true);
}

function safely(what: string, job: () => Promise<void>) {
  job().catch((err) => console.error(`Could not prepare the ${what} notice: ${(err as Error).message}`));
}

/** One message to each mentor and owner of the shop (not the asker), once per new request. */
export function noticeReviewRequested(p: {
  shopId: string;
  castingId: number;
  askerId: string;
  askerName: string;
  note?: string;
}) {
  safely("review request", async () => {
    const facts = await castingFacts(p.shopId, p.castingId);
    if (!facts) return;
    const mentors = await db
      .select({ id: user.id, email: user.email })
      .from(member)
      .innerJoin(user, eq(user.id, member.userId))
      .where(
        and(
          eq(member.organizationId, p.shopId),
          or(eq(member.role, "mentor"), eq(member.role, "owner")),
          ne(member.userId, p.askerId),
        ),
      );
    const on = new Set(
      await wanting(
        mentors.map((m) => m.id),
        "reviewRequested",
      ),
    );
    for (const m of mentors.filter((x) => on.has(x.id))) {
      void sendMail(
        reviewRequestedMail({
          to: m.email,
          shopName: facts.shopName,
          casterName: p.askerName,
          partName: facts.partName,
          note: p.note ?? null,
          url: castingLink(facts.meltId, p.castingId),
        }),
      );
    }
  });
}

/**
 * Tells whoever logged the casting, and whoever asked for the review it answers, that a mentor gave
 * its cause. `askerIds` are the people whose open requests this confirmation answered.
 */
export function noticeCauseConfirmed(p: {
  shopId: string;
  castingId: number;
  mentorId: string;
  mentorName: string;
  causeTitle: string;
  askerIds: string[];
}) {
  safely("answer", async () => {
    const facts = await castingFacts(p.shopId, p.castingId);
    if (!facts) return;
    const people = [...new Set([facts.createdBy, ...p.askerIds])].filter((id) => id !== p.mentorId);
    const on = await wanting(people, "causeConfirmed");
    if (!on.length) return;
    const rows = await db.select({ email: user.email }).from(user).where(inArray(user.id, on));
    for (const r of rows) {
      void sendMail(
        causeConfirmedMail({
          to: r.email,
          shopName: facts.shopName,
          mentorName: p.mentorName,
          partName: facts.partName,
          causeTitle: p.causeTitle,
          url: castingLink(facts.meltId, p.castingId),
        }),
      );
    }
  });
}

/** The people whose requests for this casting are still open (read before a confirmation answers them). */
export async function openRequestersOf(shopId: string, castingId: number) {
  const rows = await db
    .select({ createdBy: reviewRequests.createdBy })
    .from(reviewRequests)
    .where(
      and(
        eq(reviewRequests.shopId, shopId),
        eq(reviewRequests.castingId, castingId),
        isNull(reviewRequests.answeredAt),
      ),
    );
  return rows.map((r) => r.createdBy);
}
