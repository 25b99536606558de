import nextCoreWebVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";

const config = [
  ...nextCoreWebVitals,
  ...nextTypescript,
  { ignores: [".next/**", ".next-test/**", "node_modules/**", ".data/**", "test-results/**", "playwright-report/**", "next-env.d.ts", "**/*.tmp.ts"] },
];

export default config;
