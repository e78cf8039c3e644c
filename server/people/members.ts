import { and, desc, eq } from "drizzle-orm";
import { fromNodeHeaders } from "better-auth/node";
import type { IncomingHttpHeaders } from "node:http";
import { db } from "../db";
import { invitation, member, organization, user } from "../../db/schema";
import type { InvitationState, InvitationView } from "../../lib/people-schemas";
import { shopRole, type ShopRole } from "../../lib/permissions";
import { getAuth } from "../auth/auth";
import type { ShopMember } from "../auth/shop-access";
import { HttpError, notFound } from "../http/errors";
import { authCall } from "./auth-calls";
import { recordChange } from "./changes";

/**
 * Invitations and members through better-auth's organization plugin (its tables, its checks on
 * who may do what, its at-least-one-owner guard); this file adds the record of every change and
 * the shop's own words for a refusal.
 */
const auth = () => getAuth().api;
type Headers = IncomingHttpHeaders;
const actorOf = (m: ShopMember) => ({ id: m.userId, name: m.userName });

export async function pendingInvitations(shopId: string) {
  const rows = await db
    .select({
      id: invitation.id,
      email: invitation.email,
      role: invitation.role,
      expiresAt: invitation.expiresAt,
      createdAt: invitation.createdAt,
      inviterName: user.name,
    })
    .from(invitation)
    .innerJoin(user, eq(user.id, invitation.inviterId))
    .where(and(eq(invitation.organizationId, shopId), eq(invitation.status, "pending")))
    .orderBy(desc(invitation.createdAt));
  const now = Date.now();
  return rows.map((r) => ({
    ...r,
    role: shopRole(r.role),
    expiresAt: r.expiresAt.toISOString(),
    createdAt: r.createdAt.toISOString(),
    expired: r.expiresAt.getTime() < now,
  }));
}

export async function invite(headers: Headers, m: ShopMember, email: string, role: ShopRole) {
  const created = await authCall(() =>
    auth().createInvitation({ headers: fromNodeHeaders(headers), body: { email, role, organizationId: m.shopId } }),
  );
  await recordChange({ shopId: m.shopId, actor: actorOf(m), action: "invited", subjectEmail: email, detail: role });
  return created;
}

async function invitationOfShop(shopId: string, invitationId: string) {
  const [row] = await db
    .select()
    .from(invitation)
    .where(and(eq(invitation.id, invitationId), eq(invitation.organizationId, shopId)));
  if (!row) throw notFound("No such invitation in this shop.");
  return row;
}

/** Sends the message again and gives the link a fresh lifetime; an expired pending invitation can be revived. */
export async function resend(headers: Headers, m: ShopMember, invitationId: string) {
  const inv = await invitationOfShop(m.shopId, invitationId);
  if (inv.status !== "pending") throw new HttpError(409, `That invitation is ${stateOf(inv)}; send a new one instead.`);
  // better-auth's re-send only finds invitations that have not expired; bring an expired one back
  // into its lifetime first, so the re-send renews it and the link already in the mailbox works again.
  if (inv.expiresAt.getTime() < Date.now()) {
    await db
      .update(invitation)
      .set({ expiresAt: new Date(Date.now() + 60_000) })
      .where(eq(invitation.id, inv.id));
  }
  await authCall(() =>
    auth().createInvitation({
      headers: fromNodeHeaders(headers),
      body: { email: inv.email, role: shopRole(inv.role), organizationId: m.shopId, resend: true },
    }),
  );
  await recordChange({ shopId: m.shopId, actor: actorOf(m), action: "invitation-resent", subjectEmail: inv.email });
}

export async function cancel(headers: Headers, m: ShopMember, invitationId: string) {
  const inv = await invitationOfShop(m.shopId, invitationId);
  if (inv.status !== "pending") throw new HttpError(409, `That invitation is already ${stateOf(inv)}.`);
  await authCall(() => auth().cancelInvitation({ headers: fromNodeHeaders(headers), body: { invitationId } }));
  await recordChange({ shopId: m.shopId, actor: actorOf(m), action: "invitation-cancelled", subjectEmail: inv.email });
}

function stateOf(inv: { status: string; expiresAt: Date }): InvitationState {
  if (inv.status === "canceled") return "cancelled";
  if (inv.status === "rejected") return "declined";
  if (inv.status === "accepted") return "accepted";
  return inv.expiresAt.getTime() < Date.now() ? "expired" : "pending";
}

/** What an invitation link shows before anyone signs in; the id is a long random secret sent only to that e-mail. */
export async function openInvitation(invitationId: string): Promise<InvitationView> {
  const [row] = await db
    .select({
      id: invitation.id,
      email: invitation.email,
      role: invitation.role,
      status: invitation.status,
      expiresAt: invitation.expiresAt,
      shopName: organization.name,
      inviterName: user.name,
    })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .innerJoin(user, eq(user.id, invitation.inviterId))
    .where(eq(invitation.id, invitationId));
  if (!row) throw notFound("This invitation link is not known. Check that the whole link was copied.");
  return {
    id: row.id,
    state: stateOf(row),
    email: row.email,
    role: row.role ?? "caster",
    shopName: row.shopName,
    inviterName: row.inviterName,
    expiresAt: row.expiresAt.toISOString(),
  };
}

async function memberOfShop(shopId: string, userId: string) {
  const [row] = await db
    .select({ memberId: member.id, role: member.role, email: user.email, name: user.name })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(and(eq(member.organizationId, shopId), eq(member.userId, userId)));
  if (!row) throw notFound("No such member in this shop.");
  return row;
}

export async function changeRole(headers: Headers, m: ShopMember, userId: string, role: ShopRole) {
  const target = await memberOfShop(m.shopId, userId);
  if (target.role === role) return;
  await authCall(() =>
    auth().updateMemberRole({
      headers: fromNodeHeaders(headers),
      body: { memberId: target.memberId, role, organizationId: m.shopId },
    }),
  );
  await recordChange({
    shopId: m.shopId,
    actor: actorOf(m),
    action: "role-changed",
    subjectEmail: target.email,
    detail: `${target.role} -> ${role}`,
  });
}

export async function removeMember(headers: Headers, m: ShopMember, userId: string) {
  if (userId === m.userId) throw new HttpError(400, "To take yourself out of the shop, use Leave.");
  const target = await memberOfShop(m.shopId, userId);
  await authCall(() =>
    auth().removeMember({
      headers: fromNodeHeaders(headers),
      body: { memberIdOrEmail: target.memberId, organizationId: m.shopId },
    }),
  );
  await recordChange({
    shopId: m.shopId,
    actor: actorOf(m),
    action: "removed",
    subjectEmail: target.email,
    detail: target.role,
  });
}

/** The new owner first, then the old one steps down to mentor: at no moment is the shop without an owner. */
export async function transferOwnership(headers: Headers, m: ShopMember, userId: string) {
  if (userId === m.userId) throw new HttpError(400, "Choose another member to hand ownership to.");
  const target = await memberOfShop(m.shopId, userId);
  const me = await memberOfShop(m.shopId, m.userId);
  const h = fromNodeHeaders(headers);
  if (target.role !== "owner") {
    await authCall(() =>
      auth().updateMemberRole({
        headers: h,
        body: { memberId: target.memberId, role: "owner", organizationId: m.shopId },
      }),
    );
  }
  await authCall(() =>
    auth().updateMemberRole({ headers: h, body: { memberId: me.memberId, role: "mentor", organizationId: m.shopId } }),
  );
  await recordChange({
    shopId: m.shopId,
    actor: actorOf(m),
    action: "ownership-transferred",
    subjectEmail: target.email,
    detail: `${target.role} -> owner; ${me.email}: owner -> mentor`,
  });
}

export async function leave(headers: Headers, m: ShopMember) {
  const me = await memberOfShop(m.shopId, m.userId);
  await authCall(() =>
    auth().leaveOrganization({ headers: fromNodeHeaders(headers), body: { organizationId: m.shopId } }),
  );
  await recordChange({ shopId: m.shopId, actor: actorOf(m), action: "left", subjectEmail: me.email, detail: me.role });
}
