import { test, expect } from "@playwright/test";
import { signInAs } from "./support/sign-in";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../../seeds/01_demo_crew";

test("signing in returns to the page asked for, and never to another site", async ({ page }) => {
  await page.goto("/crew/settings");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fcrew%2Fsettings$/);
  await page.getByLabel("E-mail").fill(DEMO_PEOPLE[1].email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { name: "Crew settings" })).toBeVisible();

  await page.context().clearCookies();
  // An open-redirect attempt (OWASP Unvalidated Redirects cheat sheet): the next page stays on this site.
  await page.goto("/sign-in?next=//evil.example/steal");
  await page.getByLabel("E-mail").fill(DEMO_PEOPLE[1].email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/^http:\/\/127\.0\.0\.1:\d+\/rigs$/);
});

test("a wrong password is told plainly and nothing else happens", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(DEMO_PEOPLE[3].email);
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "do not match an account" })).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in$/);
});

test("the demo member sees the crew but cannot change its settings", async ({ page }) => {
  await signInAs(page, "member", "/crew/settings");
  await expect(page.getByText("Only a lead or an owner can change these settings.")).toBeVisible();
  await expect(page.getByLabel("Webbing (mainline and backup)")).toBeDisabled();
});
