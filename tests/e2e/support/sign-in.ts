import { expect, type Page } from "@playwright/test";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../../../seeds/01_demo_crew";

export type DemoRole = (typeof DEMO_PEOPLE)[number]["role"];

/** Signs in through the sign-in page as the demo crew's person of that role. */
export async function signInAs(page: Page, role: DemoRole, next = "/rigs"): Promise<void> {
  const person = DEMO_PEOPLE.find((p) => p.role === role)!;
  await signInWith(page, person.email, DEMO_PASSWORD, next);
}

export async function signInWith(page: Page, email: string, password: string, next = "/rigs"): Promise<void> {
  await page.goto(`/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(new RegExp(`${next.replace(/[/?]/g, "\\$&")}`));
}
