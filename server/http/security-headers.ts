import type { RequestHandler } from "express";
import helmet from "helmet";
import { env } from "../env";

/**
 * Response headers that tell the browser what a page of ours may do (issue 9, item 14), by helmet.
 *
 * The exported web app (server/web/) loads one script bundle from /_expo/static and has no inline
 * script, so scripts need only 'self'. Styles need 'unsafe-inline': react-native-web writes its
 * styles into <style> elements at run time and the opening screen (scripts/web-shell.ts) is styled
 * in attributes. Fonts and images are our own files; a picked photo shows (and is read back for
 * shrinking) from a blob: URL, and the shrunk copy may be a data: URL. The API is the same origin.
 * No page of ours is ever shown inside another site's frame.
 */
const isHttps = () => new URL(env.PUBLIC_URL).protocol === "https:";

const WEB_APP_POLICY = {
  "default-src": ["'self'"],
  "script-src": ["'self'"],
  "script-src-attr": ["'none'"],
  "style-src": ["'self'", "'unsafe-inline'"],
  "font-src": ["'self'", "data:"],
  "img-src": ["'self'", "data:", "blob:"],
  "connect-src": ["'self'", "blob:", "data:"],
  "worker-src": ["'self'", "blob:"],
  "object-src": ["'none'"],
  "base-uri": ["'self'"],
  "form-action": ["'self'"],
  "frame-ancestors": ["'none'"],
};

/** API answers are data, never a page: nothing in them may load anything or be framed. */
const API_POLICY = {
  "default-src": ["'none'"],
  "frame-ancestors": ["'none'"],
  "base-uri": ["'none'"],
  "form-action": ["'none'"],
};

/**
 * A document a browser shows in its own viewer (the case sheet PDF): its viewer is not a page of ours
 * and a policy that loads nothing can leave it blank, so such an answer keeps only the framing rule.
 */
export const VIEWER_DOCUMENT_POLICY = "frame-ancestors 'none'";

/** HSTS only when people reach us over https: sent over plain http it would be meaningless or, on a
 * host that also serves http, lock browsers out of it. 180 days, this host only (subdomains are not ours to bind). */
function headers(directives: Record<string, string[]>): RequestHandler {
  const https = isHttps();
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: https ? { ...directives, "upgrade-insecure-requests": [] } : directives,
    },
    strictTransportSecurity: https ? { maxAge: 180 * 24 * 3600, includeSubDomains: false } : false,
    xFrameOptions: { action: "deny" },
    referrerPolicy: { policy: "same-origin" },
    // Photos are fetched by our own pages only; another site may not embed them.
    crossOriginResourcePolicy: { policy: "same-site" },
  });
}

let built: { webApp: RequestHandler; api: RequestHandler } | undefined;
/** Built on first use, as PUBLIC_URL is read then (server/env.ts reads nothing at import). */
const policies = () => (built ??= { webApp: headers(WEB_APP_POLICY), api: headers(API_POLICY) });

export const webAppHeaders: RequestHandler = (req, res, next) => policies().webApp(req, res, next);
export const apiHeaders: RequestHandler = (req, res, next) => policies().api(req, res, next);
