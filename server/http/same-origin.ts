import type { RequestHandler } from "express";
import { env } from "../env";
import { HttpError } from "./errors";

/** Methods that change nothing; everything else must come from the product's own pages. */
const SAFE = new Set(["GET", "HEAD", "OPTIONS"]);

/** The product's own origin (PUBLIC_URL; `npm run dev` serves app and API from it too) and the Expo dev server's. */
export function ownOrigins(): Set<string> {
  const out = new Set([new URL(env.PUBLIC_URL).origin]);
  if (env.DEV_WEB_ORIGIN) out.add(new URL(env.DEV_WEB_ORIGIN).origin);
  return out;
}

const originOf = (url: string) => {
  try {
    return new URL(url).origin;
  } catch {
    return "null";
  }
};

/**
 * Forged requests: a page elsewhere can make the browser send a form or multipart POST with the
 * session cookie (SameSite=Lax lets same-site ones through). A browser names the page's origin in
 * `Origin` (or at least `Referer`), so a state-changing request naming another origin is refused.
 * A request naming none comes from no web page (a script with its own cookie), and is let through.
 */
export const sameOriginWrites: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  const origin = req.get("origin");
  const referer = req.get("referer");
  const claimed = origin !== undefined ? (origin === "null" ? "null" : originOf(origin)) : referer && originOf(referer);
  if (claimed && !ownOrigins().has(claimed)) {
    throw new HttpError(403, "This request came from another web site, so it was refused; nothing was changed.");
  }
  next();
};
