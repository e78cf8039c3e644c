import { createAccessControl } from "better-auth/plugins/access";
import { defaultStatements, ownerAc } from "better-auth/plugins/organization/access";

/**
 * Who may do what in a shop, in one place. The server checks every request against these
 * roles; the app uses the same roles to hide what a person may not do.
 * Caster < mentor < owner (DESIGN.md, "People and roles").
 */
export const statements = {
  ...defaultStatements,
  /** Anyone who writes archives their own melts and castings; "archive-any" is anyone's, "restore" brings one back. */
  casebook: ["read", "write", "comment", "request-review", "archive-any", "restore"],
  review: ["confirm"],
  rule: ["read", "write", "publish", "retire"],
  shop: ["settings", "export", "import", "invite"],
} as const;

export const ac = createAccessControl(statements);

const casterCan = {
  casebook: ["read", "write", "comment", "request-review"],
  rule: ["read"],
} as const;

const mentorCan = {
  ...casterCan,
  casebook: [...casterCan.casebook, "archive-any"],
  review: ["confirm"],
  rule: ["read", "write", "publish", "retire"],
} as const;

export const roles = {
  caster: ac.newRole({ ...casterCan }),
  mentor: ac.newRole({ ...mentorCan }),
  owner: ac.newRole({
    ...ownerAc.statements,
    ...mentorCan,
    casebook: [...mentorCan.casebook, "restore"],
    shop: ["settings", "export", "import", "invite"],
  }),
};

export type ShopRole = keyof typeof roles;
export const SHOP_ROLES = ["owner", "mentor", "caster"] as const satisfies readonly ShopRole[];

/**
 * A role as better-auth keeps it: `member.role` and `invitation.role` are text columns, which the
 * organization plugin only fills with the roles above (server/auth/auth.ts). Every read of them goes
 * through here, so anything else (a damaged row) is refused instead of carried on as a role that no
 * permission knows.
 */
export function shopRole(stored: string | null): ShopRole {
  if (stored !== null && (SHOP_ROLES as readonly string[]).includes(stored)) return stored as ShopRole;
  throw new Error(`not a shop role: ${JSON.stringify(stored)}`);
}

/** A permission such as `{ rule: ["publish"] }`. */
export type Permission = { [K in keyof typeof statements]?: (typeof statements)[K][number][] };

export function roleCan(role: string, permission: Permission): boolean {
  const r = roles[role as ShopRole];
  if (!r) return false;
  return r.authorize(permission as never).success;
}
