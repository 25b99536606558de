import { createSerwistRoute } from "@serwist/turbopack";
import { OFFLINE_PAGE } from "@/lib/offline/urls";

// The build's own folder, as next.config.mjs names it (the test run builds into another).
const distDir = process.env.NEXT_DIST_DIR || ".next";

// The service worker, bundled from lib/offline/service-worker.ts when the app is built and served at
// /serwist/sw.js for the whole site. It precaches every built script, style and font, and the page that
// says what works offline.
export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: "lib/offline/service-worker.ts",
  useNativeEsbuild: true,
  globPatterns: [`${distDir}/static/**/*.{js,css,woff,woff2,svg,png}`, "public/**/*"],
  additionalPrecacheEntries: [{ url: OFFLINE_PAGE, revision: process.env.npm_package_version ?? "1" }],
});
