import { test, expect } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";

const tag = Date.now().toString(36);
const founder = { name: "Rhea Kestrel", email: `rhea-${tag}@walkers.example`, password: "cliff-edge-plan-1" };
const invitee = { name: "Bram Tallow", email: `bram-${tag}@walkers.example`, password: "anchor-check-22" };

test("sign up, create a crew, invite someone by e-mail, and they join with the right role", async ({ browser }) => {
  const ownerContext = await browser.newContext();
  const owner = await ownerContext.newPage();
  await owner.goto("/sign-up");
  await owner.getByLabel("Your name").fill(founder.name);
  await owner.getByLabel("E-mail").fill(founder.email);
  await owner.getByLabel("Password").fill(founder.password);
  await owner.getByRole("button", { name: "Create account" }).click();
  await expect(owner).toHaveURL(/\/crews\/new$/);

  await owner.getByLabel("Crew name").fill(`Saltmarsh Slack Club ${tag}`);
  await owner.getByRole("button", { name: "Create crew" }).click();
  await expect(owner.getByRole("heading", { level: 1 })).toHaveText(`Saltmarsh Slack Club ${tag}`);

  await owner.getByLabel("E-mail to invite").fill(invitee.email);
  await owner.getByLabel("Role", { exact: true }).selectOption("rigger");
  await owner.getByRole("button", { name: "Send invitation" }).click();
  await expect(owner.getByRole("table", { name: "Open invitations" })).toContainText(invitee.email);
  // The page's title is streamed in after the form's refresh: check the page once it has it.
  await expect(owner).toHaveTitle(/\S/);
  const serious = (await new AxeBuilder({ page: owner }).analyze()).violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => v.id)).toEqual([]);

  await owner.goto("/dev/mail");
  const message = owner.getByRole("article", { name: `Join Saltmarsh Slack Club ${tag} on Spanwright` }).filter({ hasText: invitee.email });
  await expect(message).toBeVisible();
  const link = (await message.textContent())!.match(/https?:\/\/\S+\/invitations\/[\w-]+/)![0];

  const context = await browser.newContext();
  const guest = await context.newPage();
  await guest.goto(link);
  await expect(guest.getByRole("heading", { level: 1 })).toHaveText(`Join Saltmarsh Slack Club ${tag}`);
  await guest.getByRole("link", { name: `Create an account with ${invitee.email}` }).click();
  await guest.getByLabel("Your name").fill(invitee.name);
  await guest.getByLabel("E-mail").fill(invitee.email);
  await guest.getByLabel("Password").fill(invitee.password);
  await guest.getByRole("button", { name: "Create account" }).click();
  await guest.getByRole("button", { name: `Join Saltmarsh Slack Club ${tag}` }).click();
  await expect(guest).toHaveURL(/\/crew$/);
  await expect(guest.getByText("You are a rigger of this crew.")).toBeVisible();
  await expect(guest.getByRole("table", { name: "People in this crew" })).toContainText(founder.name);

  await owner.goto("/crew");
  await expect(owner.getByRole("combobox", { name: `Role of ${invitee.name}` })).toHaveValue("rigger");
  await context.close();
  await ownerContext.close();
});
