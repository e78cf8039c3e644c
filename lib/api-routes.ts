import type {
  Alloy,
  AlloyInput,
  Casting,
  CastingDetail,
  CastingInput,
  CastingSummary,
  Comment,
  commentInput,
  DiagnosisFreshness,
  DiagnosisSnapshot,
  Mark,
  MarkInput,
  Melt,
  MeltDetail,
  MeltInput,
  MeltSummary,
  Page,
  Units,
} from "./notebook-schemas";
import type { z } from "zod";
import type { DiagnosisCase } from "../rules/case";
import type { DiagnosisResult } from "../rules/rank";
import type { SavedCalculation, saveCalculationInput } from "./calculator-schemas";
import type {
  CaughtMessage,
  ChangePasswordInput,
  DisplayNameInput,
  InvitationView,
  InviteInput,
  MemberChange,
  NoticeSettings,
  PendingInvitation,
  RoleInput,
  SentInvitation,
} from "./people-schemas";
import type {
  CaseReview,
  CastingCauses,
  ConfirmationInput,
  FixInput,
  FixPatch,
  FixTickInput,
  FixTried,
  Followups,
  QueueItem,
  reviewRequestInput,
} from "./review-schemas";
import type { RuleDetail, RuleDraft, Rulebook, SavedRule, Trial, switchInput, trialInput } from "./rulebook-schemas";
import type { SearchAnswer, SimilarAnswer } from "./search-schemas";
import type { Me, Shop, ShopMemberRow, ShopSettingsInput } from "./shop-settings";
import type { Trends } from "./trends-schemas";

/**
 * What each API route answers, and what it is sent: one table read by the server (each handler's
 * answer `satisfies Answer<"GET /melts/:id">`) and by the app (`request("GET /melts/:id", ...)` in
 * lib/api.ts is typed by it), so a server change that the app would misread fails the typecheck on
 * one side or the other. The answer types are built from the tables' row types (lib/notebook-schemas.ts).
 * A route is "METHOD /prefix/path" as the server mounts it (server/app.ts, without /api);
 * tests/api/api-routes.test.ts checks that the routers and this table name the same routes.
 *
 * Left out, as they do not answer JSON or are not ours: GET /castings/:id/sheet.pdf (a PDF),
 * GET /export/castings.csv (CSV), /photos (multipart uploads in, image bytes out; its 204 delete shares
 * the uploads' error handling in hooks/use-photos.ts), /import (a multipart CSV upload), /health (for
 * a load balancer, not the app) and better-auth's /api/auth routes (its own client).
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

  "GET /shops/me": route<Me>(),
  "GET /shops/current": route<Shop>(),
  "GET /shops/current/members": route<{ members: ShopMemberRow[] }>(),
  "PATCH /shops/current/settings": route<Shop, ShopSettingsInput>(),
  "GET /shops/:shopId": route<Shop>(),

  "GET /people/me/units": route<Units>(),
  "PUT /people/me/units": route<Units, Units>(),
  "GET /people/me/notices": route<NoticeSettings>(),
  "PUT /people/me/notices": route<NoticeSettings, NoticeSettings>(),
  "PATCH /people/me": route<DisplayNameInput, DisplayNameInput>(),
  "POST /people/me/password": route<{ changed: true }, ChangePasswordInput>(),
  "GET /people/invitations/:id/open": route<InvitationView>(),
  "GET /people/invitations": route<{ invitations: PendingInvitation[] }>(),
  "POST /people/invitations": route<SentInvitation, InviteInput>(),
  "POST /people/invitations/:id/resend": route<{ resent: true }>(),
  "POST /people/invitations/:id/cancel": route<{ cancelled: true }>(),
  "PATCH /people/members/:userId": route<RoleInput, RoleInput>(),
  "DELETE /people/members/:userId": route<{ removed: true }>(),
  "POST /people/members/:userId/make-owner": route<{ transferred: true }>(),
  "POST /people/leave": route<{ left: true }>(),
  "GET /people/changes": route<{ changes: MemberChange[] }>(),
  /** Development only: 404 in production. */
  "GET /people/dev/inbox": route<{ messages: CaughtMessage[] }>(),
  "GET /people/dev/inbox/:id": route<CaughtMessage>(),

  "GET /calculations": route<{ items: SavedCalculation[] }>(),
  "POST /calculations": route<SavedCalculation, z.input<typeof saveCalculationInput>>(),

  "GET /trends": route<Trends>(),

  /** A case typed or pasted in, checked by the diagnosis contract (rules/case.ts); nothing is stored. */
  "POST /diagnosis": route<DiagnosisResult, DiagnosisCase>(),
  "POST /diagnosis/castings/:id": route<DiagnosisSnapshot>(),
  "GET /diagnosis/castings/:id/freshness": route<DiagnosisFreshness>(),

  "POST /comments/castings/:id": route<Comment, z.input<typeof commentInput>>(),

  "GET /review/castings/:id": route<CaseReview>(),
  "GET /review/castings/:id/causes": route<CastingCauses>(),
  /** 204: no body. */
  "POST /review/castings/:id/seen": route<void>(),
  "POST /review/castings/:id/requests": route<CaseReview, z.input<typeof reviewRequestInput>>(),
  "POST /review/castings/:id/confirmations": route<CaseReview, ConfirmationInput>(),
  "GET /review/queue": route<{ items: QueueItem[] }>(),

  "GET /rulebook": route<Rulebook>(),
  "GET /rulebook/rules/:ruleId": route<RuleDetail>(),
  "POST /rulebook/rules": route<SavedRule, RuleDraft>(),
  "PUT /rulebook/rules/:ruleId": route<SavedRule, RuleDraft>(),
  "POST /rulebook/rules/:ruleId/publish": route<SavedRule>(),
  "POST /rulebook/rules/:ruleId/retire": route<SavedRule>(),
  "PUT /rulebook/rules/:ruleId/switch": route<RuleDetail, z.infer<typeof switchInput>>(),
  "POST /rulebook/try": route<Trial, Omit<z.input<typeof trialInput>, "draft"> & { draft: RuleDraft }>(),

  "GET /search": route<SearchAnswer>(),
  "GET /search/castings/:id/similar": route<SimilarAnswer>(),
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
