import { asc, eq } from "drizzle-orm";
import { db } from "../db";
import { comments, user } from "../../db/schema";
import type { Comment } from "../../lib/notebook-schemas";
import type { ShopMember } from "../auth/shop-access";
import { castingInShop } from "../castings/lookup";
import { iso, personRef } from "../notebook/shared";

type CommentRow = typeof comments.$inferSelect;
const toComment = (c: CommentRow, byName: string): Comment => ({
  id: c.id,
  castingId: c.castingId,
  body: c.body,
  createdBy: personRef(c.createdBy, byName),
  createdAt: iso(c.createdAt),
});

/** Oldest first: a conversation reads top to bottom. */
export async function commentsOf(castingId: number): Promise<Comment[]> {
  const rows = await db
    .select({ c: comments, byName: user.name })
    .from(comments)
    .innerJoin(user, eq(user.id, comments.createdBy))
    .where(eq(comments.castingId, castingId))
    .orderBy(asc(comments.createdAt), asc(comments.id));
  return rows.map(({ c, byName }) => toComment(c, byName));
}

export async function addComment(m: ShopMember, castingId: number, body: string): Promise<Comment> {
  await castingInShop(m.shopId, castingId);
  const [row] = await db
    .insert(comments)
    .values({ shopId: m.shopId, castingId, body, createdBy: m.userId })
    .returning();
  return toComment(row, m.userName);
}
