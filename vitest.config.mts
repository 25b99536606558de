import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// Unit and integration suites run as separate projects so `npm test` can report each.
export default defineConfig({
  resolve: {
    alias: {
      "@": fileURLToPath(new URL(".", import.meta.url)),
      // The suites run on the server side: server-only's marker resolves to its empty module, as under Next's server build.
      "server-only": fileURLToPath(new URL("node_modules/server-only/empty.js", import.meta.url)),
    },
  },
  test: {
    projects: [
      { extends: true, test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" } },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      // Stops and starts the database under load: run on its own, after every other suite (scripts/test.ts).
      { extends: true, test: { name: "faults", include: ["tests/faults/**/*.test.ts"], environment: "node", testTimeout: 30000, hookTimeout: 90000 } },
    ],
  },
});
