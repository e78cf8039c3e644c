import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { API_ROUTES } from "../../lib/api-routes";
import { alloysRouter } from "../../server/alloys/router";
import { castingsRouter } from "../../server/castings/router";
import { followupsRouter } from "../../server/followups/router";
import { marksRouter } from "../../server/marks/router";
import { meltsRouter } from "../../server/melts/router";
import { calculationsRouter } from "../../server/calculations/router";
import { commentsRouter } from "../../server/comments/router";
import { diagnosisRouter } from "../../server/diagnosis/router";
import { peopleRouter } from "../../server/people/router";
import { reviewRouter } from "../../server/review/router";
import { rulebookRouter } from "../../server/rulebook/router";
import { searchRouter } from "../../server/search/router";
import { shopsRouter } from "../../server/shops/router";
import { trendsRouter } from "../../server/trends/router";

// lib/api-routes.ts types what each route answers for the server and the app. The typecheck holds the
// two to one type only where both name the route: these checks make sure every route of the typed
// routers is in the table, and that its handler checks its answer against the table's type.
const TYPED = [
  ["/alloys", alloysRouter, "server/alloys/router.ts"],
  ["/melts", meltsRouter, "server/melts/router.ts"],
  ["/castings", castingsRouter, "server/castings/router.ts"],
  ["/marks", marksRouter, "server/marks/router.ts"],
  ["/followups", followupsRouter, "server/followups/router.ts"],
  ["/shops", shopsRouter, "server/shops/router.ts"],
  ["/people", peopleRouter, "server/people/router.ts"],
  ["/calculations", calculationsRouter, "server/calculations/router.ts"],
  ["/trends", trendsRouter, "server/trends/router.ts"],
  ["/diagnosis", diagnosisRouter, "server/diagnosis/router.ts"],
  ["/comments", commentsRouter, "server/comments/router.ts"],
  ["/review", reviewRouter, "server/review/router.ts"],
  ["/rulebook", rulebookRouter, "server/rulebook/router.ts"],
  ["/search", searchRouter, "server/search/router.ts"],
] as const;

type Layer = { route?: { path: string; methods: Record<string, boolean> } };
const routesOf = (prefix: string, router: { stack: unknown[] }) =>
  (router.stack as Layer[]).flatMap((layer) =>
    layer.route
      ? Object.keys(layer.route.methods).map((m) =>
          `${m.toUpperCase()} ${prefix}${layer.route!.path}`.replace(/\/$/, ""),
        )
      : [],
  );

describe("the typed API routes (lib/api-routes.ts)", () => {
  const served = TYPED.flatMap(([prefix, router]) => routesOf(prefix, router));

  it("are exactly the routes the typed routers serve", () => {
    expect([...served].sort()).toEqual(Object.keys(API_ROUTES).sort());
  });

  it.each(TYPED.map(([prefix, , file]) => [file, prefix] as const))(
    "%s checks each answer against its route's type",
    (file, prefix) => {
      const source = readFileSync(file, "utf8");
      for (const route of Object.keys(API_ROUTES).filter((r) => r.split(" ")[1].startsWith(`${prefix}`)))
        expect({ route, named: source.includes(`Answer<"${route}">`) }).toEqual({ route, named: true });
    },
  );
});
