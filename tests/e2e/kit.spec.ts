import { test, expect } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { signInAs } from "./support/sign-in";

test("a rigger adds a webbing with its stretch points, adds an item, retires it, and finds it in the inventory", async ({ page }) => {
  await signInAs(page, "rigger", "/kit");
  await page.getByRole("link", { name: "Add a gear model" }).click();
  await page.getByLabel("Name").fill("Cirrus 19 Test Webbing");
  await page.getByLabel("Width (mm)").fill("19");
  await page.getByLabel("Mass per metre (g/m)").fill("31");
  await page.getByLabel("MBS (kN)").fill("22");
  await page.getByLabel("Point 2 tension, kN").fill("5");
  await page.getByLabel("Point 2 elongation, %").fill("80");
  await page.getByRole("button", { name: "Add to the Kit" }).click();
  await expect(page.getByText("Elongation must be at most 60 %.")).toBeVisible();
  await page.getByLabel("Point 2 elongation, %").fill("6,5");
  await page.getByRole("button", { name: "Add to the Kit" }).click();

  await expect(page.getByRole("heading", { name: "Cirrus 19 Test Webbing" })).toBeVisible();
  await page.getByRole("link", { name: "Edit specs" }).click();
  await expect(page.getByText("Kind: Webbing")).toBeVisible();
  await page.getByLabel("MBS (kN)").fill("23");
  await page.getByRole("button", { name: "Save changes" }).click();
  await expect(page.getByRole("heading", { name: "Cirrus 19 Test Webbing" })).toBeVisible();
  await expect(page.getByText("23.00 kN")).toBeVisible();
  await page.getByText("Add an item").click();
  await page.getByLabel("Serial or label").fill("C19-1");
  await page.getByRole("button", { name: "Add item" }).click();
  await page.getByRole("link", { name: "C19-1" }).click();

  await page.getByRole("button", { name: "Retire item" }).click();
  await page.getByLabel("Why").fill("Cut on a sharp edge");
  await page.getByRole("button", { name: "Retire item" }).last().click();
  await expect(page.getByText(/It cannot be put in a new plan/)).toBeVisible();

  await page.goto("/kit");
  await page.getByLabel("Search").first().fill("C19");
  await expect(page.getByRole("table", { name: "Items" })).toContainText("Retired");
  const serious = (await new AxeBuilder({ page }).analyze()).violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
});

test("a member reads the Kit but is offered no way to change it", async ({ page }) => {
  await signInAs(page, "member", "/kit");
  await expect(page.getByRole("table", { name: "Gear models" })).toContainText("Toothed cam brake");
  await expect(page.getByRole("link", { name: "Add a gear model" })).toHaveCount(0);
});
