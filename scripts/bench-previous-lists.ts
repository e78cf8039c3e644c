/**
 * The castings and melts lists as they were paged before keyset paging (OFFSET into the shop's rows
 * sorted by the melt's day, and a count of the whole shop on every page), kept here only so that
 * `npm run bench:load` can print their figures beside today's. Only bench-server.ts mounts it, at
 * /api/bench-previous, behind the same shop check; the page's rows are dressed by today's code, so
 * the two differ only in how the page is found.
 */
import { and, count, desc, eq, isNull } from "drizzle-orm";
import { Router, type RequestHandler } from "express";
import { castings, melts } from "../db/schema";
import { currentMember, requireShopMember } from "../server/auth/shop-access";
import { castingSummaries } from "../server/castings/service";
import { db } from "../server/db";
import { meltSummaries } from "../server/melts/service";

const pageOf = (q: Record<string, unknown>) => ({ page: Math.max(1, Number(q.page) || 1), pageSize: 20 });
const safely =
  (handler: RequestHandler): RequestHandler =>
  async (req, res, next) => {
    try {
      await handler(req, res, next);
    } catch (e) {
      next(e);
    }
  };

export function previousLists() {
  const router = Router();
  router.use(requireShopMember);
  router.get(
    "/castings",
    safely(async (req, res) => {
      const { shopId, userId } = currentMember(req);
      const { page, pageSize } = pageOf(req.query);
      const inUse = and(eq(castings.shopId, shopId), isNull(castings.archivedAt), isNull(melts.archivedAt));
      const rows = await db
        .select({ id: castings.id })
        .from(castings)
        .innerJoin(melts, eq(melts.id, castings.meltId))
        .where(inUse)
        .orderBy(desc(melts.pouredOn), desc(castings.id))
        .limit(pageSize)
        .offset((page - 1) * pageSize);
      const [{ total }] = await db
        .select({ total: count() })
        .from(castings)
        .innerJoin(melts, eq(melts.id, castings.meltId))
        .where(inUse);
      const items = await castingSummaries(shopId, { ids: rows.map((r) => r.id), viewer: userId });
      res.json({ items, total, page, pageSize });
    }),
  );
  router.get(
    "/melts",
    safely(async (req, res) => {
      const { shopId } = currentMember(req);
      const { page, pageSize } = pageOf(req.query);
      const inUse = and(eq(melts.shopId, shopId), isNull(melts.archivedAt));
      const rows = await db
        .select({ id: melts.id })
        .from(melts)
        .where(inUse)
        .orderBy(desc(melts.pouredOn), desc(melts.id))
        .limit(pageSize)
        .offset((page - 1) * pageSize);
      const [{ total }] = await db.select({ total: count() }).from(melts).where(inUse);
      res.json({
        items: await meltSummaries(
          shopId,
          rows.map((r) => r.id),
        ),
        total,
        page,
        pageSize,
      });
    }),
  );
  return router;
}
