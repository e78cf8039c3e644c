import { eq } from "drizzle-orm";
import { db } from "../db";
import { personUnits, shopSettings, user } from "../../db/schema";
import { env } from "../env";
import { existingAccountMail, invitationMail, passwordResetMail } from "../mail/messages";
import { sendMail } from "../mail/send";
import { shopsOf } from "../shops/service";
import { recordChange } from "./changes";

/**
 * What better-auth calls when it needs a message sent or a membership changed: kept here, away
 * from server/auth/auth.ts, which only spreads these options into its config.
 */

export const INVITATION_LIFETIME_S = 7 * 24 * 3600;
export const RESET_LIFETIME_S = 3600;

export const invitationLink = (invitationId: string) => `${env.PUBLIC_URL}/invitation/${invitationId}`;
export const resetLink = (token: string) => `${env.PUBLIC_URL}/reset-password?token=${encodeURIComponent(token)}`;

type InvitationData = {
  id: string;
  role: string;
  email: string;
  organization: { name: string };
  invitation: { expiresAt: Date };
  inviter: { user: { name: string } };
};

/** A newcomer starts with the shop's default units, unless they already chose their own. */
async function inheritShopUnits(userId: string, shopId: string) {
  const [s] = await db.select().from(shopSettings).where(eq(shopSettings.shopId, shopId));
  if (!s?.defaultTemperature && !s?.defaultLength && !s?.defaultMass) return;
  await db
    .insert(personUnits)
    .values({
      userId,
      temperature: s.defaultTemperature ?? "C",
      length: s.defaultLength ?? "mm",
      mass: s.defaultMass ?? "kg",
    })
    .onConflictDoNothing();
}

/** Options for better-auth's organization plugin. */
export const invitationOptions = {
  invitationExpiresIn: INVITATION_LIFETIME_S,
  // The invitation is saved before this runs; sendMail retries in the background and never throws,
  // so a lost message leaves a valid invitation the owner can re-send.
  sendInvitationEmail: async (data: InvitationData) => {
    void sendMail(
      invitationMail({
        to: data.email,
        shopName: data.organization.name,
        inviterName: data.inviter.user.name,
        role: data.role,
        url: invitationLink(data.id),
        expiresAt: new Date(data.invitation.expiresAt),
      }),
    );
  },
  organizationHooks: {
    // Following the link from the message shows the person reads that mailbox: the e-mail counts as verified.
    afterAcceptInvitation: async (data: {
      invitation: { role: string; email: string };
      user: { id: string; name: string };
      organization: { id: string };
    }) => {
      await db.update(user).set({ emailVerified: true }).where(eq(user.id, data.user.id));
      await inheritShopUnits(data.user.id, data.organization.id);
      await recordChange({
        shopId: data.organization.id,
        actor: data.user,
        action: "joined",
        subjectEmail: data.invitation.email,
        detail: data.invitation.role,
      });
    },
  },
};

/** Options for better-auth's e-mail and password sign-in: the reset flow. */
export const passwordResetOptions = {
  resetPasswordTokenExpiresIn: RESET_LIFETIME_S,
  revokeSessionsOnPasswordReset: true,
  // better-auth answers the request the same way whether or not the account exists, and calls this only when it does.
  sendResetPassword: async (data: { user: { id: string; email: string }; token: string }) => {
    const shops = await shopsOf(data.user.id);
    void sendMail(
      passwordResetMail({ to: data.user.email, url: resetLink(data.token), shopNames: shops.map((s) => s.name) }),
    );
  },
};

/**
 * Sign-up answers a taken address exactly as it answers a new one (issue 9, item 13): better-auth does
 * so when sign-up does not sign the person in (`autoSignIn: false`; the app signs in right after), and
 * then calls `onExistingUserSignUp` instead of making an account. Its owner is told by mail.
 */
export const signUpOptions = {
  autoSignIn: false,
  onExistingUserSignUp: async (data: { user: { email: string } }) => {
    void sendMail(existingAccountMail({ to: data.user.email, signInUrl: `${env.PUBLIC_URL}/sign-in` }));
  },
};
