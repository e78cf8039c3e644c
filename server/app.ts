import { toNodeHandler } from "better-auth/node";
import compression from "compression";
import cors from "cors";
import express from "express";
import { env } from "./env";
import { getAuth } from "./auth/auth";
import { clientAddressForAuth } from "./auth/client-address";
import { healthRouter } from "./health/router";
import { apiNotFound, errorHandler } from "./http/errors";
import { apiBodies, authBodies, readablePath } from "./http/edge";
import { sameOriginWrites } from "./http/same-origin";
import { apiHeaders, webAppHeaders } from "./http/security-headers";
import { shopsRouter } from "./shops/router";
import { sheetRouter } from "./sheet/router";
import { searchRouter } from "./search/router";
import { alloysRouter } from "./alloys/router";
import { castingsRouter } from "./castings/router";
import { commentsRouter } from "./comments/router";
import { diagnosisRouter } from "./diagnosis/router";
import { exportRouter } from "./export/router";
import { importRouter } from "./import/router";
import { marksRouter } from "./marks/router";
import { meltsRouter } from "./melts/router";
import { peopleRouter } from "./people/router";
import { photosRouter } from "./photos/router";
import { followupsRouter } from "./followups/router";
import { reviewRouter } from "./review/router";
import { rulebookRouter } from "./rulebook/router";
import { calculationsRouter } from "./calculations/router";
import { trendsRouter } from "./trends/router";
import { serveWebApp } from "./web/static";

// Each router under its own prefix, so a URL names its file: /api/marks/... is server/marks/router.ts.
// The notebook (docs/notebook-api.md); photos take multipart bodies through multer, not express.json.
export const API_ROUTERS: [string, express.Router][] = [
  ["/health", healthRouter],
  ["/shops", shopsRouter],
  ["/people", peopleRouter],
  ["/alloys", alloysRouter],
  ["/melts", meltsRouter],
  ["/calculations", calculationsRouter],
  ["/trends", trendsRouter],
  // The case sheet beside the casting it prints (server/sheet), before the casting routes.
  ["/castings", sheetRouter],
  ["/castings", castingsRouter],
  ["/photos", photosRouter],
  ["/marks", marksRouter],
  ["/comments", commentsRouter],
  ["/export", exportRouter],
  ["/import", importRouter],
  ["/diagnosis", diagnosisRouter],
  // Mentors (docs/mentor-api.md): review, follow-ups and the shop's rulebook; then the casebook search.
  ["/review", reviewRouter],
  ["/followups", followupsRouter],
  ["/rulebook", rulebookRouter],
  ["/search", searchRouter],
];

/**
 * The whole HTTP surface: better-auth under /api/auth, the API under /api, and the exported
 * web app (when `webDir` holds one) for every other path. Built here, started in server/index.ts,
 * so tests call `request(createApp())` without a port.
 */
const noStore: express.RequestHandler = (_req, res, next) => {
  res.set("Cache-Control", "no-store");
  next();
};

export function createApp(opts: { webDir?: string } = {}) {
  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", env.TRUST_PROXY);

  if (env.DEV_WEB_ORIGIN) app.use(cors({ origin: env.DEV_WEB_ORIGIN, credentials: true, exposedHeaders: ["ETag"] }));

  // Content-Security-Policy, no framing, HSTS over https (server/http/security-headers.ts).
  app.use("/api", apiHeaders);
  // Before any body is read: a write from another site's page is refused.
  app.use("/api", sameOriginWrites);
  // Answers are one person's view of the shop and change with every write: never kept by the browser.
  // (A row's ETag is for If-Match on PATCH; without no-store a browser would revalidate a melt's page
  // with If-None-Match and be told 304 while its castings had changed under the same melt version.)
  app.use("/api", noStore);
  // JSON and CSV answers go out gzip- or brotli-compressed to a browser that accepts it (a casebook page
  // of 20 cases is about 9 KB as JSON, under 2 KB compressed); photos and PDFs are left as they are.
  app.use("/api", compression());
  // better-auth re-reads a body that is already parsed, so its bodies are bounded here first.
  app.all("/api/auth/{*any}", ...authBodies, clientAddressForAuth, toNodeHandler(getAuth()));

  const api = express.Router();
  api.use(readablePath, ...apiBodies);
  for (const [prefix, router] of API_ROUTERS) api.use(prefix, router);
  api.use(apiNotFound);
  app.use("/api", api);

  if (opts.webDir) {
    app.use(webAppHeaders);
    serveWebApp(app, opts.webDir);
  }
  app.use(errorHandler);
  return app;
}
