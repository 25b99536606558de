import { test, expect } from "@playwright/test";
import example from "../../physics/examples/quarry-highline.json";
import { signInAs } from "./support/sign-in";

// The crew's job loop, second half: a rigger submits a rig, the lead finds the review request in the
// local mailbox and signs it off, and a member on site sees it signed, runs the checklist, records a
// load-cell reading and uses the rig for another site. People and gear are the invented demo crew's.

test("submit, sign off from the e-mail, and the day on site", async ({ browser, baseURL }) => {
  // Three people, two reloads each: longer than one page's test.
  test.setTimeout(120_000);
  const name = `E2E review ${Date.now()}`;
  const rigger = await (await browser.newContext()).newPage();
  await signInAs(rigger, "rigger");
  const created = await rigger.request.post("/api/rigs", { data: { name, siteId: null, inputs: example }, headers: { origin: baseURL! } });
  expect(created.status()).toBe(201);
  const rigId = (await created.json()).rig.id as string;

  await rigger.goto(`/rigs/${rigId}`);
  await expect(rigger.getByTestId("sign-off-status")).toContainText("No revision of this rig is signed off yet");
  await rigger.getByLabel("Note for the reviewer on revision 1").fill("Bridle at A is new: please check its angle.");
  await rigger.getByRole("button", { name: "Submit for review" }).click();
  await expect(rigger.getByText("Revision 1 is in review: the crew's leads and owners were asked to review it")).toBeVisible({ timeout: 15_000 });

  const lead = await (await browser.newContext()).newPage();
  await signInAs(lead, "lead");
  await lead.goto("/dev/mail");
  const mail = lead
    .getByRole("article", { name: `Review ${name} (revision 1) for Greyrock Highline Collective` })
    .filter({ hasText: "idris@greyrock.example" });
  await expect(mail).toContainText("Bridle at A is new");
  const link = (await mail.textContent())!.match(/https?:\/\/\S+?\/rigs\/[\w-]+\/review/)![0];
  await lead.goto(new URL(link).pathname);
  await expect(lead.getByRole("heading", { name: `Review of ${name}` })).toBeVisible();
  await expect(lead.getByText("Bridle at A is new: please check its angle.")).toBeVisible();
  await expect(lead.getByText("No revision of this rig has been signed off before: check every input.")).toBeVisible();
  await lead.getByRole("button", { name: "Sign off this revision" }).click();
  await expect(lead.getByText("Confirm the statement: tick the box to sign off.")).toBeVisible();
  await lead.getByLabel(/I have checked this revision's inputs and figures/).check();
  await lead.getByRole("button", { name: "Sign off this revision" }).click();
  await expect(lead).toHaveURL(new RegExp(`/rigs/${rigId}$`), { timeout: 15_000 });
  await expect(lead.getByTestId("sign-off-status")).toContainText("Revision 1 is signed off, by Idris Vell");

  const member = await (await browser.newContext()).newPage();
  await signInAs(member, "member");
  await member.goto(`/rigs/${rigId}`);
  const status = member.getByTestId("sign-off-status");
  await expect(status).toContainText("Its inputs, figures and engine version are as signed");
  await expect(status).toContainText("Evaluated again with today's engine: same figures");

  await member.getByRole("button", { name: "Start the checklist" }).click();
  const first = member.getByRole("checkbox", { name: /^Anchors as planned/ });
  // The box shows what the server holds: it turns ticked once the tick has landed.
  await first.click();
  await expect(first).toBeChecked();
  await expect(member.getByText(/Ticked by Tove Harlan/)).toBeVisible();

  await member.getByLabel("Tension read (kN)").fill("3.4");
  await member.getByLabel("Sag measured at mid-span (m)").fill("1.3");
  await member.getByRole("button", { name: "Record the reading" }).click();
  const row = member.locator("tr", { hasText: "sag 1.30 m at mid-span" });
  await expect(row).toContainText("3.40 kN");
  await expect(row).toContainText(/[+-]\d+\.\d %/);

  await member.getByLabel("Name of the new rig").fill(`${name}, at the gorge`);
  await member.getByLabel("Site of the new rig").selectOption({ label: "Corvid Gorge, east notch" });
  await member.getByRole("button", { name: "Use this rig" }).click();
  await expect(member.getByRole("heading", { name: `${name}, at the gorge` })).toBeVisible({ timeout: 15_000 });
  await expect(member.getByText(`Started from ${name}, signed-off revision 1.`)).toBeVisible();
  await expect(member.getByTestId("sign-off-status")).toContainText("No revision of this rig is signed off yet");
});
