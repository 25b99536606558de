import fs from "node:fs";
import { aptInstall } from "./apt";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH || "/usr/bin/chromium";

/** Debian's Chromium for the browser tests; Playwright never downloads a browser of its own. */
export async function ensureChromium(): Promise<void> {
  if (fs.existsSync(CHROMIUM_PATH)) return;
  await aptInstall(["chromium", "fonts-dejavu-core"], "the browser tests");
}
