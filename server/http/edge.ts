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

/** JSON for the API; photos come through multer with their own limit (server/photos/router.ts). */
export const apiBodies: RequestHandler[] = [express.json({ limit: API_BODY_LIMIT })];

/**
 * better-auth reads the raw stream itself unless the body is already parsed (then it re-serialises
 * req.body), so parsing here first is what bounds it. Any other type is read as text, also bounded.
 */
export const authBodies: RequestHandler[] = [
  express.json({ limit: AUTH_BODY_LIMIT }),
  express.urlencoded({ extended: false, limit: AUTH_BODY_LIMIT }),
  express.text({ type: () => true, limit: AUTH_BODY_LIMIT }),
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
