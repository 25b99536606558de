import { test, expect } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";

test("the first page names the product and has no serious accessibility violations", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByText("Spanwright").first()).toBeVisible();
  await expect(page.getByRole("heading", { level: 1 })).toContainText("check before anyone walks");
  await expect(page.getByRole("complementary", { name: "Safety cautions" })).toContainText("load cell");
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
});

test("the first page works on a phone-sized screen", async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto("/");
  const signIn = page.getByRole("link", { name: "Sign in" });
  await expect(signIn).toBeVisible();
  // Large targets for gloved hands: at least 44 px tall (WCAG 2.5.5 target size, enhanced).
  const box = await signIn.boundingBox();
  expect(box?.height ?? 0).toBeGreaterThanOrEqual(44);
});

test("the health route reports the database and the latest migration", async ({ request }) => {
  const response = await request.get("/api/health");
  expect(response.status()).toBe(200);
  const body = await response.json();
  expect(body.status).toBe("ok");
  expect(body.database.reachable).toBe(true);
  expect(body.database.latestMigration).toMatch(/\.ts$/);
});
