// Run by planner.bench.ts in a process of its own: the planner in Debian's Chromium against a running
// app (BENCH_APP_URL, the production build of `npm start`), signed in as the demo rigger. Prints JSON:
// the first-load JavaScript of the planner page (bytes as sent, gzipped by the server) and the time of
// each walker move while dragging, from the pointer event to the next frame after the figures and the
// diagram were redrawn (the page marks both, see components/rigs/line-diagram.tsx).
import { chromium } from "@playwright/test";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../../seeds/01_demo_crew";

const CHROMIUM_FLAGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync"];
const MOVES = 200;

async function main(appUrl: string) {
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || "/usr/bin/chromium", args: CHROMIUM_FLAGS });
  const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
  const rigger = DEMO_PEOPLE.find((p) => p.role === "rigger")!;
  await page.goto(`${appUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(rigger.email);
  await page.getByLabel("Password", { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  const rigs = (await (await page.request.get(`${appUrl}/api/rigs?sort=name`)).json()) as { rigs: { id: string }[] };
  if (!rigs.rigs.length) throw new Error("The demo crew has no rigs: run the benchmark against the seeded demo.");

  const scripts: Promise<number>[] = [];
  page.on("response", (response) => {
    if (response.request().resourceType() === "script")
      scripts.push(
        response
          .request()
          .sizes()
          .then((s) => s.responseBodySize),
      );
  });
  await page.goto(`${appUrl}/rigs/${rigs.rigs[0].id}`, { waitUntil: "networkidle" });
  const slider = page.getByRole("slider", { name: "Walker position on the side view" });
  await slider.waitFor();
  const firstLoadBytes = (await Promise.all(scripts)).reduce((a, b) => a + b, 0);

  const box = (await slider.boundingBox())!;
  const y = box.y + box.height / 2;
  await page.evaluate(() => performance.clearMeasures());
  await page.mouse.move(box.x + box.width * 0.2, y);
  await page.mouse.down();
  for (let i = 0; i < MOVES; i++) {
    // Back and forth between a fifth and four fifths of the span, as a rigger's finger would.
    const t = (i % 100) / 99;
    const f = i % 200 < 100 ? t : 1 - t;
    await page.mouse.move(box.x + box.width * (0.2 + 0.6 * f), y);
    await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
  }
  await page.mouse.up();
  const [commits, frames] = await page.evaluate(() =>
    ["walker-commit", "walker-frame"].map((name) => performance.getEntriesByName(name).map((e) => e.duration)),
  );
  await browser.close();
  process.stdout.write(JSON.stringify({ firstLoadBytes, commits, frames }));
}

main(process.env.BENCH_APP_URL!).catch((error) => {
  console.error(error);
  process.exit(1);
});
