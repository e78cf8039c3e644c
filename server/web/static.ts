import type { Express } from "express";
import type { ServerResponse } from "node:http";
import expressStaticGzip from "express-static-gzip";
import { existsSync } from "node:fs";
import { basename, join } from "node:path";

/** Expo names bundles and assets after their content (`entry-<32 hex>.js`, `icon.<32 hex>.png`). */
const CONTENT_HASH = /[.-][0-9a-f]{32}(@\dx)?\.[a-z0-9]+(\.(br|gz))?$/i;

/** A hashed name changes with its content, so it may be kept for a year; anything else is checked each time. */
function setCacheHeaders(res: ServerResponse, filePath: string) {
  const hashed = CONTENT_HASH.test(basename(filePath));
  res.setHeader("Cache-Control", hashed ? "public, max-age=31536000, immutable" : "no-cache");
}

/**
 * Serves the exported web app from `webDir`: the brotli or gzip file written beside each file at
 * build time (scripts/web-compress.ts) when the browser accepts it, and index.html for every other path.
 */
export function serveWebApp(app: Express, webDir: string) {
  if (!existsSync(join(webDir, "index.html"))) return;
  app.use(
    expressStaticGzip(webDir, {
      enableBrotli: true,
      orderPreference: ["br", "gzip"],
      index: "index.html",
      serveStatic: { extensions: ["html"], index: false, setHeaders: setCacheHeaders },
    }),
  );
  // Routes of the single-page app: the client router reads the path from index.html.
  app.get("/{*splat}", (_req, res) => {
    res.setHeader("Cache-Control", "no-cache");
    res.sendFile(join(webDir, "index.html"), { cacheControl: false });
  });
}
