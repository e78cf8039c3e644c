import type { Mail } from "./send";

/** Text for HTML: every message is plain text first, with a simple HTML copy beside it. */
const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

function compose(to: string, subject: string, paragraphs: string[], link: { url: string; label: string }): Mail {
  const text = [...paragraphs, `${link.label}: ${link.url}`, "", "-- Shakeout Casebook"].join("\n\n");
  const html = [
    '<div style="font-family: sans-serif; font-size: 16px; line-height: 1.5; color: #222;">',
    ...paragraphs.map((p) => `<p>${escape(p)}</p>`),
    `<p><a href="${escape(link.url)}" style="color: #a0430a; font-weight: 600;">${escape(link.label)}</a></p>`,
    `<p style="color: #666; font-size: 13px;">Or paste this address into your browser: ${escape(link.url)}</p>`,
    '<p style="color: #666; font-size: 13px;">-- Shakeout Casebook</p>',
    "</div>",
  ].join("\n");
  return { to, subject, text, html };
}

const ROLE_WORDS: Record<string, string> = {
  owner: "an owner (everything a mentor does, plus people and shop settings)",
  mentor: "a mentor (reviews cases and keeps the shop's rules)",
  caster: "a caster (logs melts and castings and asks for diagnoses)",
};

export function invitationMail(p: {
  to: string;
  shopName: string;
  inviterName: string;
  role: string;
  url: string;
  expiresAt: Date;
}): Mail {
  return compose(
    p.to,
    `${p.inviterName} invites you to ${p.shopName} on Shakeout Casebook`,
    [
      `${p.inviterName} invites you to join ${p.shopName} on Shakeout Casebook as ${ROLE_WORDS[p.role] ?? p.role}.`,
      `The link works until ${p.expiresAt.toUTCString()}. If you did not expect this, you can ignore it.`,
    ],
    { url: p.url, label: `Join ${p.shopName}` },
  );
}

export function passwordResetMail(p: { to: string; url: string; shopNames: string[] }): Mail {
  const shops = p.shopNames.length ? ` (${p.shopNames.join(", ")})` : "";
  return compose(
    p.to,
    "Set a new password for Shakeout Casebook",
    [
      `Someone asked to set a new password for the Shakeout Casebook account of ${p.to}${shops}.`,
      "The link works once, for one hour. After the new password is set, every signed-in window of this account is signed out. If you did not ask, ignore this message: your password stays as it is.",
    ],
    { url: p.url, label: "Set a new password" },
  );
}

/** Sent instead of "that address is taken", so sign-up tells no one which addresses have an account. */
export function existingAccountMail(p: { to: string; signInUrl: string }): Mail {
  return compose(
    p.to,
    "Someone tried to make a Shakeout Casebook account with your address",
    [
      `Someone tried to make a new Shakeout Casebook account for ${p.to}, which already has one. No new account was made and nothing in yours changed.`,
      'If it was you, sign in with your password, or use "Forgot your password?" on the sign-in page to set a new one. If it was not you, you can ignore this message.',
    ],
    { url: p.signInUrl, label: "Sign in" },
  );
}

const TURN_OFF = "You can turn these notices off under More, Your notices.";

export function reviewRequestedMail(p: {
  to: string;
  shopName: string;
  casterName: string;
  partName: string;
  note: string | null;
  url: string;
}): Mail {
  return compose(
    p.to,
    `${p.shopName}: ${p.casterName} asks for a review of ${p.partName}`,
    [
      `${p.casterName} asks a mentor of ${p.shopName} to look at the casting "${p.partName}" and confirm what caused its defects.`,
      ...(p.note ? [`Their note: ${p.note}`] : []),
      TURN_OFF,
    ],
    { url: p.url, label: "Open the casting" },
  );
}

export function causeConfirmedMail(p: {
  to: string;
  shopName: string;
  mentorName: string;
  partName: string;
  causeTitle: string;
  url: string;
}): Mail {
  return compose(
    p.to,
    `${p.shopName}: ${p.mentorName} answered on ${p.partName}`,
    [
      `${p.mentorName} of ${p.shopName} looked at your casting "${p.partName}" and gave its cause as: ${p.causeTitle}.`,
      TURN_OFF,
    ],
    { url: p.url, label: "See the answer" },
  );
}
