import { describe, expect, it } from "vitest";
import { SHOP_ROLES, shopRole } from "../../lib/permissions";

/** Roles read back from better-auth's text columns (lib/permissions.ts shopRole). */
describe("a stored shop role", () => {
  it("is read as one of the shop's roles", () => {
    for (const role of SHOP_ROLES) expect(shopRole(role)).toBe(role);
  });

  it("refuses anything else instead of carrying it on", () => {
    // "member" and "admin" are better-auth's own defaults, which this product never writes.
    for (const stored of ["member", "admin", "Owner", "", null])
      expect(() => shopRole(stored)).toThrow(/not a shop role/);
  });
});
