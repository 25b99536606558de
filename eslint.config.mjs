import nextCoreWebVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";

// Who may import whom (DEVELOPERS.md, "Layers"), lowest first: physics/ imports nothing of the app;
// lib's shared modules (no I/O; they run in the browser too) import physics/ and each other; db/ imports
// db/, physics/ and shared lib; lib's server modules below import any of those; components/ and app/ on top.
export const SERVER_LIB = [
  "lib/{api,app-origin,authz,server-edge,rate-limit,storage,worker-pool}.ts",
  "lib/auth/{current-password,lucia,passwords,require-signed-in,session,session-adapter}.ts",
  "lib/mail/**",
  "lib/planner/{catalogue,page-data,revision-of-record}.ts",
  "lib/review/{rig-review-data,on-site-answer}.ts",
  // The rig card is made on the server only (its route and print page), in the planner's own words (components/rigs/verdict-words.ts).
  "lib/rig-card/**",
];

const APP_LAYERS = ["components/**", "app/**"];

const layer = (files, from, message, ignores = []) => ({
  files,
  ignores,
  rules: { "import/no-restricted-paths": ["error", { zones: [{ target: files, from, message }] }] },
});

const config = [
  ...nextCoreWebVitals,
  ...nextTypescript,
  { ignores: [".next/**", ".next-test/**", "node_modules/**", ".data/**", "test-results/**", "playwright-report/**", "next-env.d.ts", "**/*.tmp.ts"] },
  layer(["physics/**"], ["lib/**", "db/**", "seeds/**", ...APP_LAYERS], "physics/ is the engine: it imports nothing of the app."),
  layer(
    ["db/**"],
    [...SERVER_LIB, ...APP_LAYERS],
    "db/ sits below lib's server modules, components/ and app/: it imports only db/, physics/ and lib's shared modules.",
  ),
  layer(
    ["lib/**"],
    ["db/**", ...SERVER_LIB, ...APP_LAYERS],
    "A shared lib/ module runs in the browser too: it imports only physics/ and other shared lib/ modules, never db/ or lib's server modules (eslint.config.mjs, SERVER_LIB).",
    SERVER_LIB,
  ),
];

export default config;
