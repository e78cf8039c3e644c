import { sql } from "drizzle-orm";
import { Router } from "express";
import { db } from "../../db/client";

export const healthRouter = Router();

/** Says whether the database answers; 503 when it does not, so a load balancer can tell. */
healthRouter.get("/", async (_req, res) => {
  try {
    await db.execute(sql`select 1`);
    res.json({ ok: true, database: "up" });
  } catch {
    res.status(503).json({ ok: false, database: "down" });
  }
});
