import js from "@eslint/js";
import tseslint from "typescript-eslint";
import importX, { createNodeResolver } from "eslint-plugin-import-x";
import reactHooks from "eslint-plugin-react-hooks";
import pluginQuery from "@tanstack/eslint-plugin-query";
import globals from "globals";

// The dependency arrows of DEVELOPERS.md ("Which way dependencies flow"), enforced.
const zones = [
  // shared/ imports neither the client nor the server
  { target: "./shared", from: ["./src", "./server", "./tests"], message: "shared/ must not import src/, server/ or tests/." },
  // the engine imports only itself
  { target: "./shared/thermal", from: ["./shared/schemas", "./shared/permissions.ts", "./shared/units.ts"], message: "shared/thermal imports only shared/thermal." },
  // the client and the server meet only through shared/
  { target: "./src", from: ["./server", "./tests"], message: "src/ must not import server/." },
  { target: "./server", from: ["./src", "./tests"], message: "server/ must not import src/." },
  // server tiers: routes -> services -> repositories -> schema
  { target: "./server/services", from: ["./server/routes", "./server/middleware", "./server/app.ts"], message: "services never see routes or middleware." },
  { target: "./server/db", from: ["./server/services", "./server/routes", "./server/middleware"], message: "the db layer is below services." },
  { target: "./server/routes", from: ["./server/db"], message: "routes call services, not repositories." },
  // client layers: components/lib/hooks/utils/config never import features or app
  { target: ["./src/components", "./src/lib", "./src/hooks", "./src/utils", "./src/config"], from: ["./src/features", "./src/app"], message: "shared client code must not import features or app." },
  { target: "./src/features", from: ["./src/app"], message: "features must not import app/." },
];
// A feature never imports another feature.
const features = ["auth", "team", "outbox", "designs", "compare", "library", "boil-off-tests", "alerts"];
for (const f of features) {
  zones.push({ target: `./src/features/${f}`, from: "./src/features", except: [`./${f}`], message: "a feature must not import another feature; combine them in src/app/routes." });
}

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", ".data/**", "drizzle/**", "test-results/**", "playwright-report/**"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { "import-x": importX },
    settings: {
      "import-x/resolver-next": [createNodeResolver({ extensions: [".ts", ".tsx", ".js", ".json"] })],
    },
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      "import-x/no-restricted-paths": ["error", { zones }],
      "import-x/no-cycle": ["error", { maxDepth: 4 }],
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      "@typescript-eslint/no-namespace": "off",
    },
  },
  {
    files: ["shared/**/*.ts"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: ["node:*", "express", "drizzle-orm", "drizzle-orm/*", "react"], message: "shared/ is pure: no Node, Express, Drizzle or React." }] }],
    },
  },
  {
    files: ["server/**/*.ts"],
    ignores: ["server/db/**"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: ["drizzle-orm", "drizzle-orm/*"], message: "only server/db/** talks to Drizzle." }] }],
    },
  },
  {
    files: ["server/services/**/*.ts", "server/db/**/*.ts", "server/mail/**/*.ts"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: ["express"], message: "only app.ts, routes/ and middleware/ import Express." }] }],
    },
  },
  {
    files: ["src/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks, "@tanstack/query": pluginQuery },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...pluginQuery.configs.recommended.rules,
      "no-restricted-imports": ["error", { patterns: [{ group: ["node:*", "express", "drizzle-orm", "drizzle-orm/*"], message: "the client never imports server-side modules." }] }],
    },
  },
);
