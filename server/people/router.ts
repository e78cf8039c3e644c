import { fromNodeHeaders } from "better-auth/node";
import { Router, type Request, type RequestHandler } from "express";
import type { Answer } from "../../lib/api-routes";
import { unitsInput } from "../../lib/notebook-schemas";
import {
  changePasswordInput,
  displayNameInput,
  inviteInput,
  noticeSettingsInput,
  roleInput,
} from "../../lib/people-schemas";
import { getAuth } from "../auth/auth";
import { allow, currentMember, requireShopMember, sessionOf } from "../auth/shop-access";
import { HttpError, notFound, parseOr400 } from "../http/errors";
import { caughtMessage, caughtMessages } from "../mail/inbox";
import { env } from "../env";
import { authCall } from "./auth-calls";
import { changesOf } from "./changes";
import * as members from "./members";
import { noticeSettingsOf, saveNoticeSettings } from "./notices";
import { saveUnits, unitsOf } from "./service";

export const peopleRouter = Router();

/** Units, name and password belong to the person, not a shop: signed in is enough. */
async function signedInUserId(req: Request) {
  const session = await sessionOf(req.headers);
  if (!session) throw new HttpError(401, "Please sign in.");
  return session.user.id;
}

peopleRouter.get("/me/units", async (req, res) => {
  res.json((await unitsOf(await signedInUserId(req))) satisfies Answer<"GET /people/me/units">);
});

peopleRouter.put("/me/units", async (req, res) => {
  const userId = await signedInUserId(req);
  res.json((await saveUnits(userId, parseOr400(unitsInput, req.body))) satisfies Answer<"PUT /people/me/units">);
});

peopleRouter.get("/me/notices", async (req, res) => {
  res.json((await noticeSettingsOf(await signedInUserId(req))) satisfies Answer<"GET /people/me/notices">);
});

peopleRouter.put("/me/notices", async (req, res) => {
  const userId = await signedInUserId(req);
  res.json(
    (await saveNoticeSettings(
      userId,
      parseOr400(noticeSettingsInput, req.body),
    )) satisfies Answer<"PUT /people/me/notices">,
  );
});

peopleRouter.patch("/me", async (req, res) => {
  await signedInUserId(req);
  const { name } = parseOr400(displayNameInput, req.body);
  await authCall(() => getAuth().api.updateUser({ headers: fromNodeHeaders(req.headers), body: { name } }));
  res.json({ name } satisfies Answer<"PATCH /people/me">);
});

/** A new password ends every other session of the person; this one stays signed in. */
peopleRouter.post("/me/password", async (req, res) => {
  await signedInUserId(req);
  const input = parseOr400(changePasswordInput, req.body);
  try {
    await authCall(() =>
      getAuth().api.changePassword({
        headers: fromNodeHeaders(req.headers),
        body: { ...input, revokeOtherSessions: true },
        returnHeaders: true,
      }),
    ).then(({ headers }) => {
      const cookies = headers.getSetCookie();
      if (cookies.length) res.setHeader("Set-Cookie", cookies);
    });
  } catch (err) {
    if (err instanceof HttpError && err.status === 400) {
      throw new HttpError(400, "Some values need fixing.", { currentPassword: err.message });
    }
    throw err;
  }
  res.json({ changed: true } satisfies Answer<"POST /people/me/password">);
});

/** What an invitation link shows, signed in or not (the accept page). */
peopleRouter.get("/invitations/:id/open", async (req, res) => {
  res.json((await members.openInvitation(String(req.params.id))) satisfies Answer<"GET /people/invitations/:id/open">);
});

const ownerOnly = allow({ invitation: ["create"] });

peopleRouter.get("/invitations", requireShopMember, ownerOnly, async (req, res) => {
  res.json({
    invitations: await members.pendingInvitations(currentMember(req).shopId),
  } satisfies Answer<"GET /people/invitations">);
});

peopleRouter.post("/invitations", requireShopMember, ownerOnly, async (req, res) => {
  const input = parseOr400(inviteInput, req.body);
  const created = await members.invite(req.headers, currentMember(req), input.email, input.role);
  res.status(201).json({
    id: created.id,
    email: created.email,
    role: created.role,
    expiresAt: created.expiresAt.toISOString(),
  } satisfies Answer<"POST /people/invitations">);
});

peopleRouter.post("/invitations/:id/resend", requireShopMember, ownerOnly, async (req, res) => {
  await members.resend(req.headers, currentMember(req), String(req.params.id));
  res.json({ resent: true } satisfies Answer<"POST /people/invitations/:id/resend">);
});

peopleRouter.post("/invitations/:id/cancel", requireShopMember, ownerOnly, async (req, res) => {
  await members.cancel(req.headers, currentMember(req), String(req.params.id));
  res.json({ cancelled: true } satisfies Answer<"POST /people/invitations/:id/cancel">);
});

const manageMembers = allow({ member: ["update", "delete"] });

peopleRouter.patch("/members/:userId", requireShopMember, manageMembers, async (req, res) => {
  const { role } = parseOr400(roleInput, req.body);
  await members.changeRole(req.headers, currentMember(req), String(req.params.userId), role);
  res.json({ role } satisfies Answer<"PATCH /people/members/:userId">);
});

peopleRouter.delete("/members/:userId", requireShopMember, manageMembers, async (req, res) => {
  await members.removeMember(req.headers, currentMember(req), String(req.params.userId));
  res.json({ removed: true } satisfies Answer<"DELETE /people/members/:userId">);
});

peopleRouter.post("/members/:userId/make-owner", requireShopMember, manageMembers, async (req, res) => {
  await members.transferOwnership(req.headers, currentMember(req), String(req.params.userId));
  res.json({ transferred: true } satisfies Answer<"POST /people/members/:userId/make-owner">);
});

/** Any member may leave; the last owner is stopped by better-auth's guard. */
peopleRouter.post("/leave", requireShopMember, async (req, res) => {
  await members.leave(req.headers, currentMember(req));
  res.json({ left: true } satisfies Answer<"POST /people/leave">);
});

peopleRouter.get("/changes", requireShopMember, manageMembers, async (req, res) => {
  res.json({ changes: await changesOf(currentMember(req).shopId) } satisfies Answer<"GET /people/changes">);
});

/** The development inbox: what the local mail catcher received. It does not exist in production. */
const devOnly: RequestHandler = (_req, _res, next) => {
  if (env.NODE_ENV === "production") throw notFound("No such API route");
  next();
};

peopleRouter.get("/dev/inbox", devOnly, requireShopMember, manageMembers, async (_req, res) => {
  res.json({ messages: await caughtMessages() } satisfies Answer<"GET /people/dev/inbox">);
});

peopleRouter.get("/dev/inbox/:id", devOnly, requireShopMember, manageMembers, async (req, res) => {
  const message = await caughtMessage(String(req.params.id));
  if (!message) throw notFound("No such message");
  res.json(message satisfies Answer<"GET /people/dev/inbox/:id">);
});
