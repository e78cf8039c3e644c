import type {
  Alloy,
  AlloyInput,
  Casting,
  CastingDetail,
  CastingInput,
  CastingSummary,
  Mark,
  MarkInput,
  Melt,
  MeltDetail,
  MeltInput,
  MeltSummary,
  Page,
} from "./notebook-schemas";
import type { FixInput, FixPatch, FixTickInput, FixTried, Followups } from "./review-schemas";

/**
 * What each API route answers, and what it is sent: one table read by the server (each handler's
 * answer `satisfies Answer<"GET /melts/:id">`) and by the app (`request("GET /melts/:id", ...)` in
 * lib/api.ts is typed by it), so a server change that the app would misread fails the typecheck on
 * one side or the other. The answer types are built from the tables' row types (lib/notebook-schemas.ts).
 * A route is "METHOD /prefix/path" as the server mounts it (server/app.ts, without /api);
 * tests/api/api-routes.test.ts checks that the routers and this table name the same routes.
 */
const route = <AnswerType, BodyType = never>() => ({}) as { answer: AnswerType; body: BodyType };

export const API_ROUTES = {
  "GET /alloys": route<{ alloys: Alloy[] }>(),
  "POST /alloys": route<Alloy, AlloyInput>(),

  "GET /melts": route<Page<MeltSummary>>(),
  "GET /melts/defaults": route<Partial<MeltInput>>(),
  "POST /melts": route<Melt, MeltInput>(),
  "GET /melts/:id": route<MeltDetail>(),
  "PATCH /melts/:id": route<Melt, Partial<MeltInput>>(),
  "POST /melts/:id/archive": route<Melt>(),
  "POST /melts/:id/restore": route<Melt>(),

  "POST /castings/melts/:id": route<Casting, CastingInput>(),
  "GET /castings": route<Page<CastingSummary>>(),
  "GET /castings/:id": route<CastingDetail>(),
  "PATCH /castings/:id": route<Casting, Partial<CastingInput>>(),
  "POST /castings/:id/archive": route<Casting>(),
  "POST /castings/:id/restore": route<Casting>(),

  "POST /marks/castings/:id": route<Mark, MarkInput>(),
  "PATCH /marks/:id": route<Mark, Partial<MarkInput>>(),
  /** 204: no body. */
  "DELETE /marks/:id": route<void>(),

  "GET /followups/castings/:id": route<Followups>(),
  "POST /followups/castings/:id/fixes": route<FixTried, FixInput>(),
  "PATCH /followups/fixes/:id": route<FixTried, FixPatch>(),
  "PUT /followups/castings/:id/ticks": route<{ ticked: string[] }, FixTickInput>(),
};
export type ApiRoute = keyof typeof API_ROUTES;
export type Answer<R extends ApiRoute> = (typeof API_ROUTES)[R]["answer"];
export type Body<R extends ApiRoute> = (typeof API_ROUTES)[R]["body"];

/** The `:name` parts of a route's path, each a number or text to put in the URL. */
type ParamNames<P extends string> = P extends `${string}:${infer Name}/${infer Rest}`
  ? Name | ParamNames<Rest>
  : P extends `${string}:${infer Name}`
    ? Name
    : never;
export type Params<R extends ApiRoute> = { [K in ParamNames<R>]: number | string };
