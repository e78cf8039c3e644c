import { desc, eq } from "drizzle-orm";
import { db } from "../db";
import { memberChanges } from "../../db/schema";
import type { MemberChange } from "../../lib/people-schemas";

export type MemberChangeAction =
  | "invited"
  | "invitation-resent"
  | "invitation-cancelled"
  | "joined"
  | "role-changed"
  | "removed"
  | "ownership-transferred"
  | "left";

export async function recordChange(change: {
  shopId: string;
  actor: { id: string; name: string };
  action: MemberChangeAction;
  subjectEmail: string;
  detail?: string;
}) {
  await db.insert(memberChanges).values({
    shopId: change.shopId,
    actorId: change.actor.id,
    actorName: change.actor.name,
    action: change.action,
    subjectEmail: change.subjectEmail,
    detail: change.detail ?? null,
  });
}

/** The shop's record of member changes, newest first. */
export async function changesOf(shopId: string, limit = 100): Promise<MemberChange[]> {
  const rows = await db
    .select({
      id: memberChanges.id,
      actorName: memberChanges.actorName,
      action: memberChanges.action,
      subjectEmail: memberChanges.subjectEmail,
      detail: memberChanges.detail,
      createdAt: memberChanges.createdAt,
    })
    .from(memberChanges)
    .where(eq(memberChanges.shopId, shopId))
    .orderBy(desc(memberChanges.createdAt), desc(memberChanges.id))
    .limit(limit);
  return rows.map(({ createdAt, ...r }) => ({ ...r, at: createdAt.toISOString() }));
}
