import fs from "node:fs/promises";
import { test, expect } from "@playwright/test";
import { PDFParse } from "pdf-parse";
import AxeBuilder from "@axe-core/playwright";
import { signInAs } from "./support/sign-in";

// A member takes a rig to the site: the rig card from the rig page, printed without the app's frame, and its PDF
// downloaded and read back with a general-purpose PDF parser (pdf-parse, on Mozilla's pdf.js).

test("a member opens the rig card from the rig page, prints it without the app's frame and downloads its PDF", async ({ page }) => {
  await signInAs(page, "member", "/rigs");
  await page.getByRole("link", { name: "Corvid Gorge highline" }).first().click();
  await page.getByRole("link", { name: "Rig card to print" }).click();
  // The first visit may wait for the page to be compiled under the development server.
  await expect(page).toHaveURL(/\/rigs\/[0-9a-f-]+\/card\?revision=/, { timeout: 20_000 });
  const card = page.getByRole("article", { name: "Rig card" });
  await expect(card.getByRole("heading", { name: "Corvid Gorge highline" })).toBeVisible();
  await expect(card.getByRole("region", { name: "Sign-off" })).toContainText(/SIGNED OFF|SUPERSEDED/);
  await expect(card).toContainText("Pretension target, nobody on the line");
  await expect(card.getByRole("img", { name: "QR code: opens this revision of the rig" })).toBeVisible();

  const serious = (await new AxeBuilder({ page }).analyze()).violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(" ")).join(", ")})`)).toEqual([]);

  // On paper: the card alone, no sections, no buttons.
  await expect(page.getByRole("link", { name: "Kit", exact: true })).toBeVisible();
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("link", { name: "Kit", exact: true })).toBeHidden();
  await expect(page.getByRole("button", { name: "Print" })).toBeHidden();
  await expect(card).toBeVisible();
  await page.emulateMedia({ media: "screen" });

  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download PDF" }).click()]);
  expect(download.suggestedFilename()).toMatch(/^rig-card-Corvid-Gorge-highline-revision-\d+\.pdf$/);
  const parser = new PDFParse({ data: new Uint8Array(await fs.readFile((await download.path())!)) });
  try {
    const { text, total } = await parser.getText();
    expect(total).toBe(1);
    expect(text).toContain("Corvid Gorge highline");
    expect(text).toMatch(/SIGNED OFF|SUPERSEDED/);
  } finally {
    await parser.destroy();
  }
});

test("the rig card reads on a phone: the sign-off state first, each component as a short block", async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await signInAs(page, "member", "/rigs");
  await page.getByRole("link", { name: "Corvid Gorge highline" }).first().click();
  await page.getByRole("link", { name: "Rig card to print" }).click();
  await expect(page).toHaveURL(/\/card\?revision=/, { timeout: 20_000 });
  const card = page.getByRole("article", { name: "Rig card" });
  await expect(card.getByRole("region", { name: "Sign-off" })).toBeInViewport();
  await expect(card.getByRole("table")).toBeHidden();
  await expect(card.getByText(/Factor \d+\.\d\d \(minimum/).first()).toBeVisible();
  // Nothing wider than the screen.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});
