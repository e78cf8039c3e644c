import { createHmac, timingSafeEqual } from "node:crypto";
import { parseCookies } from "better-auth/cookies";
import type { IncomingHttpHeaders } from "node:http";
import { connection } from "../db";
import { shopRole, type ShopRole } from "../../lib/permissions";
import { getAuth } from "./auth";

/**
 * The floor under every shop request: who is signed in and their membership of the active shop,
 * read in ONE prepared statement from the session, user and member tables. Nothing is cached in
 * the process or in a cookie, so signing out, a password reset (which ends the sessions), a removed
 * member or a changed role count on the next request on every server.
 *
 * better-auth's own getSession stays the judge of anything unusual: this answers only for a
 * correctly signed session cookie whose session row is live and not yet due for better-auth's
 * sliding renewal (`updateAge`); a session that is expired, due for renewal, or a token without a
 * row goes through getSession as before (it renews, clears cookies and removes expired rows).
 * Measured by `npm run bench:load` (the floor target) and scripts/cpu-profile-summary.ts.
 */
export type SessionMember = {
  userId: string;
  userName: string;
  activeShopId: string | null;
  /** The active shop's membership, or without an active shop the oldest one; null when none. */
  shop: { shopId: string; role: ShopRole } | null;
};

/** better-auth signs the token as `token.base64(HMAC-SHA256(secret, token))` (better-call's signed cookies). */
function verifiedToken(signed: string | undefined, secret: string): string | null {
  if (!signed) return null;
  const dot = signed.lastIndexOf(".");
  if (dot < 1) return null;
  const token = signed.slice(0, dot);
  const signature = Buffer.from(signed.slice(dot + 1), "base64");
  const expected = createHmac("sha256", secret).update(token).digest();
  return signature.length === expected.length && timingSafeEqual(signature, expected) ? token : null;
}

// Timestamps are stored without a zone, in UTC (better-auth's drizzle columns): compared in UTC here.
const STATEMENT = `
  SELECT s.user_id, u.name, s.active_organization_id, m.organization_id, m.role,
    s.expires_at > (now() AT TIME ZONE 'utc') AS live,
    s.expires_at - make_interval(secs => $2) <= (now() AT TIME ZONE 'utc') AS due_for_renewal
  FROM session s
  JOIN "user" u ON u.id = s.user_id
  LEFT JOIN LATERAL (
    SELECT organization_id, role FROM member
    WHERE user_id = s.user_id AND (s.active_organization_id IS NULL OR organization_id = s.active_organization_id)
    ORDER BY created_at LIMIT 1
  ) m ON true
  WHERE s.token = $1`;

type Row = {
  user_id: string;
  name: string;
  active_organization_id: string | null;
  organization_id: string | null;
  role: string | null;
  live: boolean;
  due_for_renewal: boolean;
};

/**
 * The session's person and membership in one query, or "unsigned" (no cookie or a bad signature:
 * not signed in, as getSession would say), or "ask-better-auth" (see above).
 */
export async function sessionMember(
  headers: IncomingHttpHeaders,
): Promise<SessionMember | "unsigned" | "ask-better-auth"> {
  const ctx = await getAuth().$context;
  const cookie = headers.cookie;
  if (!cookie) return "unsigned";
  const token = verifiedToken(parseCookies(cookie).get(ctx.authCookies.sessionToken.name), ctx.secret);
  if (!token) return "unsigned";
  const { expiresIn, updateAge } = ctx.sessionConfig;
  const { rows } = await connection().pool.query<Row>({
    name: "casebook-session-member",
    text: STATEMENT,
    values: [token, expiresIn - updateAge],
  });
  const row = rows[0];
  if (!row || !row.live || row.due_for_renewal) return "ask-better-auth";
  return {
    userId: row.user_id,
    userName: row.name,
    activeShopId: row.active_organization_id,
    shop: row.organization_id ? { shopId: row.organization_id, role: shopRole(row.role) } : null,
  };
}
