import { defineConfig } from "vitest/config";
import base from "./vitest.config.mts";

// The unit project narrowed to the engine's suites, for Stryker (stryker.config.mjs): the other unit suites and the
// integration project (which needs the running stack) exercise physics/ only through the app.
export default defineConfig({
  resolve: base.resolve,
  // Instrumented code runs several times slower than the plain suite: the dense-quadrature tests need more than 5 s.
  test: { name: "unit", include: ["tests/unit/physics/**/*.test.ts"], environment: "node", testTimeout: 60000 },
});
