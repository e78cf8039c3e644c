import { APIError, createAuthMiddleware } from "better-auth/api";
import { hasNul } from "../../lib/fields";
import { passwordProblem } from "./password-rules";

/**
 * better-auth checks the shape of its bodies but not the size of a display name or a NUL byte,
 * which PostgreSQL refuses (a 500) and a list of members would repeat at any length.
 * So every auth request's text is checked here before better-auth acts on it.
 */
export const NAME_MAX = 80;
const ANY_TEXT_MAX = 2000;

/** Fields that show in lists, with their longest sensible length. */
const BOUNDED: Record<string, number> = { name: NAME_MAX, slug: 60, email: 254 };

function problem(value: unknown, path: string, depth = 0): string | undefined {
  if (depth > 4) return `${path}: nested too deeply`;
  if (typeof value === "string") {
    if (hasNul(value)) return `${path || "a field"} must not contain a NUL character`;
    const key = path.split(".").pop() ?? "";
    const max = BOUNDED[key] ?? ANY_TEXT_MAX;
    if (value.trim().length > max) return `${key || "a field"} must be at most ${max} characters`;
    return undefined;
  }
  if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      const found = problem(v, path ? `${path}.${k}` : k, depth + 1);
      if (found) return found;
    }
  }
  return undefined;
}

export const authInputGuard = createAuthMiddleware(async (ctx) => {
  const found = problem(ctx.body, "") ?? problem(ctx.query, "");
  if (found) throw new APIError("BAD_REQUEST", { message: found });
  // A new password (sign-up, change, reset) must not be a common one; sign-in is left alone.
  const body = (ctx.body ?? {}) as Record<string, unknown>;
  const fresh = ctx.path === "/sign-up/email" ? body.password : body.newPassword;
  if (typeof fresh === "string") {
    const weak = passwordProblem(
      fresh,
      [body.email, body.name].filter((v): v is string => typeof v === "string"),
    );
    if (weak) throw new APIError("BAD_REQUEST", { message: weak });
  }
});
