import { z } from "zod";
import { invitation } from "../db/auth-schema";
import { memberChanges, noticeSettings } from "../db/people-schema";
import { emailField, passwordField } from "./auth-forms";
import { requiredText } from "./fields";
import { SHOP_ROLES, type ShopRole } from "./permissions";
import { tableInput } from "./table-schemas";

/** Inputs of the people routes (server/people) and the forms that send them. */
export const roleField = z.enum(SHOP_ROLES, { error: "Choose owner, mentor or caster" });

export const inviteInput = z.object({ email: emailField, role: roleField });
export type InviteInput = z.infer<typeof inviteInput>;

export const roleInput = z.object({ role: roleField });

export const displayNameInput = z.object({ name: requiredText("Enter a name", 80, "Use at most 80 characters") });

export const changePasswordInput = z.object({
  currentPassword: requiredText("Enter your current password", 128),
  newPassword: passwordField,
});

export const forgotPasswordForm = z.object({ email: emailField });
export const resetPasswordForm = z
  .object({ newPassword: passwordField, repeat: z.string() })
  .refine((v) => v.newPassword === v.repeat, { path: ["repeat"], message: "The two passwords differ" });

/** Signing up from an invitation: the e-mail is the invited one, so only name and password. */
export const invitedSignUpForm = z.object({
  name: displayNameInput.shape.name,
  password: passwordField,
});

export type InvitationState = "pending" | "expired" | "cancelled" | "accepted" | "declined";

/** What the accept page learns from an invitation link. */
export type InvitationView = {
  id: string;
  state: InvitationState;
  email: string;
  role: string;
  shopName: string;
  inviterName: string;
  expiresAt: string;
};

export const MEMBER_CHANGE_WORDS: Record<string, string> = {
  invited: "invited",
  "invitation-resent": "re-sent the invitation to",
  "invitation-cancelled": "cancelled the invitation to",
  joined: "joined",
  "role-changed": "changed the role of",
  removed: "removed",
  "ownership-transferred": "handed ownership to",
  left: "left",
};

/** E-mail notices each person can turn off: the notice_settings row, whose person is the one signed in. */
export const noticeSettingsInput = tableInput(
  noticeSettings,
  {
    reviewRequested: z.boolean({ error: "true or false" }),
    causeConfirmed: z.boolean({ error: "true or false" }),
  },
  ["userId"],
).strict();
export type NoticeSettings = z.infer<typeof noticeSettingsInput>;

// ---- Answers of server/people (JSON: times are ISO strings) ----
type InvitationRow = typeof invitation.$inferSelect;
type MemberChangeRow = typeof memberChanges.$inferSelect;

/** An invitation still waiting, as the owner's list shows it. */
export type PendingInvitation = Pick<InvitationRow, "id" | "email"> & {
  role: ShopRole;
  expiresAt: string;
  createdAt: string;
  inviterName: string;
  expired: boolean;
};
/** POST /people/invitations: the invitation just sent. */
export type SentInvitation = Pick<PendingInvitation, "id" | "email" | "role" | "expiresAt">;
/** One line of the shop's record of member changes (the member_changes row; `at` is its createdAt). */
export type MemberChange = Pick<MemberChangeRow, "id" | "actorName" | "action" | "subjectEmail" | "detail"> & {
  at: string;
};
/** A message the local mail catcher received (server/mail/inbox.ts), for the development inbox. */
export type CaughtMessage = { id: string; to: string[]; subject: string; date: string; text: string; links: string[] };
export type RoleInput = z.infer<typeof roleInput>;
export type DisplayNameInput = z.infer<typeof displayNameInput>;
export type ChangePasswordInput = z.infer<typeof changePasswordInput>;
