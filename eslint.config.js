import js from "@eslint/js";
import tseslint from "typescript-eslint";
import { layerRules } from "./eslint-layers.js";

export default tseslint.config(
  { ignores: ["node_modules/", "dist/", ".expo/", ".data/", "uploads/", "drizzle/", "tests/e2e/screenshots/"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      "@typescript-eslint/no-require-imports": "off", // Expo loads fonts and images with require()
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_" }],
      // Configuration is read and validated in one place each for server and app.
      "no-restricted-properties": [
        "error",
        {
          object: "process",
          property: "env",
          message: "Read configuration through server/env.ts (server) or lib/client-env.ts (app).",
        },
      ],
    },
  },
  {
    files: ["app/**/*.tsx", "components/**/*.tsx"],
    rules: {
      "no-restricted-syntax": [
        "error",
        {
          selector: "Property[key.name='fontSize'][value.type='Literal']",
          message: "Use a size of the type scale: fontSize.body, fontSize.detail... (constants/theme.ts).",
        },
      ],
    },
  },
  {
    files: ["server/env.ts", "lib/client-env.ts", "scripts/**", "tests/**", "*.config.ts", "*.config.js"],
    rules: { "no-restricted-properties": "off" },
  },
  {
    files: ["*.cjs"],
    languageOptions: {
      sourceType: "commonjs",
      globals: { require: "readonly", module: "writable", __dirname: "readonly" },
    },
  },
  ...layerRules,
);
