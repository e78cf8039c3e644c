import { organizationClient } from "better-auth/client/plugins";
import { createAuthClient } from "better-auth/react";
import { apiBaseUrl } from "./client-env";
import { ac, roles } from "./permissions";

export const authClient = createAuthClient({
  baseURL: apiBaseUrl,
  fetchOptions: { credentials: "include" },
  plugins: [organizationClient({ ac, roles })],
});
