import express, { type RequestHandler } from "express";
import { hasControl } from "../../lib/fields";
import { HttpError } from "./errors";

/**
 * What every request passes before a router sees it: bounded bodies and a readable address.
 * Bodies are read only up to their limit (a larger Content-Length is refused before reading;
 * a chunked body is cut off at the limit), so a 150 MB body never sits in memory.
 */
export const API_BODY_LIMIT = "256kb";
/** Sign-in, sign-up and shop names: a few hundred bytes; 16 kB leaves room and no more. */
export const AUTH_BODY_LIMIT = "16kb";

/** How deep a body may nest: better-auth's are flat; the API's deepest (a rule's conditions) a few levels. */
export const AUTH_BODY_DEPTH = 8;
export const API_BODY_DEPTH = 64;

/**
 * A parsed body nested deeper than `max` is refused. JSON.parse takes thousands of levels in a few
 * kilobytes, but code after it that walks the body by recursion (better-auth re-serialises it with
 * JSON.stringify) runs out of stack: a 500. Measured without recursion, so the check cannot overflow.
 */
export function boundedNesting(max: number): RequestHandler {
  return (req, _res, next) => {
    const pending: [unknown, number][] = [[req.body, 0]];
    while (pending.length) {
      const [value, depth] = pending.pop()!;
      if (!value || typeof value !== "object") continue;
      if (depth >= max) throw new HttpError(400, `The request body is nested more than ${max} levels deep.`);
      for (const child of Object.values(value)) pending.push([child, depth + 1]);
    }
    next();
  };
}

/** JSON for the API; photos come through multer with their own limit (server/photos/router.ts). */
export const apiBodies: RequestHandler[] = [express.json({ limit: API_BODY_LIMIT }), boundedNesting(API_BODY_DEPTH)];

/**
 * better-auth reads the raw stream itself unless the body is already parsed (then it re-serialises
 * req.body), so parsing here first is what bounds it. Any other type is read as text, also bounded.
 */
export const authBodies: RequestHandler[] = [
  express.json({ limit: AUTH_BODY_LIMIT }),
  express.urlencoded({ extended: false, limit: AUTH_BODY_LIMIT }),
  express.text({ type: () => true, limit: AUTH_BODY_LIMIT }),
  boundedNesting(AUTH_BODY_DEPTH),
];

/**
 * Route parameters are read from the path: one whose decoded text holds a NUL or another control
 * byte can name no row, and PostgreSQL would refuse it as a value (a 500). Refused here for every route.
 */
export const readablePath: RequestHandler = (req, _res, next) => {
  for (const segment of req.path.split("/")) {
    let decoded: string;
    try {
      decoded = decodeURIComponent(segment);
    } catch {
      throw new HttpError(400, "The address is not valid: a %-escape in it is broken.");
    }
    if (hasControl(decoded)) throw new HttpError(400, "The address holds a control character; no row has that name.");
  }
  next();
};
