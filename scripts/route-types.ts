/**
 * Writes Expo Router's typed-routes declaration (`.expo/types/router.d.ts`) from the files in `app/`,
 * so `npm run typecheck` checks every href on a clean checkout, where no dev server has written it yet.
 * It calls the same generator the Expo dev server runs when it starts (typedRoutes is on in app.json).
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..");
const appRoot = path.join(root, "app");
process.env.EXPO_ROUTER_APP_ROOT = appRoot;

const require = createRequire(path.join(root, "package.json"));
const expoDir = path.dirname(require.resolve("expo/package.json"));
const cliDir = path.dirname(require.resolve("@expo/cli/package.json", { paths: [expoDir] }));
const { getTypedRoutesDeclarationFile } = require(
  require.resolve("@expo/router-server/build/typed-routes/generate", { paths: [cliDir] }),
);
const { requireContext } = require("expo-router/internal/testing");
const { EXPO_ROUTER_CTX_IGNORE } = require("expo-router/_ctx-shared");

const declaration: string = getTypedRoutesDeclarationFile(requireContext(appRoot, true, EXPO_ROUTER_CTX_IGNORE), {});
if (!declaration) throw new Error("Expo Router found no routes in app/");
mkdirSync(path.join(root, ".expo/types"), { recursive: true });
writeFileSync(path.join(root, ".expo/types/router.d.ts"), declaration);
