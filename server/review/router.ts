import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { confirmationInput, reviewRequestInput } from "../../lib/review-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { idParam } from "../notebook/shared";
import { noticeCauseConfirmed, noticeReviewRequested, openRequestersOf } from "../people/notices";
import { caseReview, castingCauses, confirmCause, markAnswerSeen, requestReview, reviewQueue } from "./service";

/** Review of a casting: anyone in the shop asks and reads; mentors and owners see the queue and confirm. */
export const reviewRouter = Router();
const castingId = (v: unknown) => idParam(v, "No such casting");

reviewRouter.get("/castings/:id", requireShopMember, allow({ casebook: ["read"] }), async (req, res) => {
  res.json(
    (await caseReview(
      currentMember(req).shopId,
      castingId(req.params.id),
    )) satisfies Answer<"GET /review/castings/:id">,
  );
});

/** The whole rulebook's causes for this casting: the confirm form searches them, "record a fix" offers their fixes. */
reviewRouter.get("/castings/:id/causes", requireShopMember, allow({ casebook: ["read"] }), async (req, res) => {
  res.json(
    (await castingCauses(
      currentMember(req).shopId,
      castingId(req.params.id),
    )) satisfies Answer<"GET /review/castings/:id/causes">,
  );
});

/** The person has read the answer on this casting: its "new answer" mark goes from their lists. */
reviewRouter.post("/castings/:id/seen", requireShopMember, allow({ casebook: ["read"] }), async (req, res) => {
  (await markAnswerSeen(
    currentMember(req),
    castingId(req.params.id),
  )) satisfies Answer<"POST /review/castings/:id/seen">;
  res.status(204).end();
});

reviewRouter.post(
  "/castings/:id/requests",
  requireShopMember,
  allow({ casebook: ["request-review"] }),
  async (req, res) => {
    const { note } = parseOr400(reviewRequestInput, req.body ?? {});
    const m = currentMember(req);
    const id = castingId(req.params.id);
    const { created, review } = await requestReview(m, id, note);
    // Mentors hear of a request once: asking again while it is open sends nothing.
    if (created)
      noticeReviewRequested({ shopId: m.shopId, castingId: id, askerId: m.userId, askerName: m.userName, note });
    res.status(created ? 201 : 200).json(review satisfies Answer<"POST /review/castings/:id/requests">);
  },
);

reviewRouter.post(
  "/castings/:id/confirmations",
  requireShopMember,
  allow({ review: ["confirm"] }),
  async (req, res) => {
    const id = castingId(req.params.id);
    const input = parseOr400(confirmationInput, req.body);
    const m = currentMember(req);
    const askerIds = await openRequestersOf(m.shopId, id);
    const review = await confirmCause(m, id, input);
    noticeCauseConfirmed({
      shopId: m.shopId,
      castingId: id,
      mentorId: m.userId,
      mentorName: m.userName,
      causeTitle: review.current?.causeTitle ?? "",
      askerIds,
    });
    res.status(201).json(review satisfies Answer<"POST /review/castings/:id/confirmations">);
  },
);

reviewRouter.get("/queue", requireShopMember, allow({ review: ["confirm"] }), async (req, res) => {
  res.json({ items: await reviewQueue(currentMember(req).shopId) } satisfies Answer<"GET /review/queue">);
});
