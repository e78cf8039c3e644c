import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { organization } from "better-auth/plugins";
import { db } from "../db";
import * as schema from "../../db/schema";
import { PASSWORD_MIN } from "../../lib/auth-forms";
import { ac, roles } from "../../lib/permissions";
import { env } from "../env";
import { invitationOptions, passwordResetOptions, signUpOptions } from "../people/auth-hooks";
import { CLIENT_ADDRESS_HEADER } from "./client-address";
import { authInputGuard } from "./input-guard";
import { AUTH_RATE_LIMITS } from "./rate-limits";

/**
 * Sign-in with e-mail and password; shops are better-auth organizations, with our three roles.
 * Whoever creates a shop owns it. The app and the API share one origin, so cookies just work.
 */
function buildAuth() {
  return betterAuth({
    baseURL: env.PUBLIC_URL,
    secret: env.BETTER_AUTH_SECRET,
    trustedOrigins: [env.PUBLIC_URL, ...(env.DEV_WEB_ORIGIN ? [env.DEV_WEB_ORIGIN] : [])],
    database: drizzleAdapter(db, { provider: "pg", schema }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: PASSWORD_MIN,
      maxPasswordLength: 128,
      // Password reset by e-mail (issue 10): server/people/auth-hooks.ts.
      ...passwordResetOptions,
      // A taken address gets the same answer as a new one, and its owner a notice: server/people/auth-hooks.ts.
      ...signUpOptions,
    },
    telemetry: { enabled: false },
    advanced: { ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] } },
    // Counted in the database, so every server shares one count per client (server/auth/rate-limits.ts).
    rateLimit: {
      enabled: env.RATE_LIMIT === "on",
      storage: "database",
      modelName: "rateLimit",
      window: 60,
      max: 100,
      customRules: AUTH_RATE_LIMITS,
    },
    hooks: { before: authInputGuard },
    plugins: [
      organization({
        ac,
        roles,
        creatorRole: "owner",
        // Invitations by e-mail and the record of who joined (issue 10): server/people/auth-hooks.ts.
        ...invitationOptions,
      }),
    ],
  });
}

type Auth = ReturnType<typeof buildAuth>;
let built: Auth | undefined;

/** Built on first use (it reads the environment), then shared by the whole process. */
export function getAuth(): Auth {
  built ??= buildAuth();
  return built;
}

export type Session = Auth["$Infer"]["Session"];
