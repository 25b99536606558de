import { test, expect, type Page } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { signInAs } from "./support/sign-in";

// The crew's job loop, first half: a site with its ground, a rig planned on it from the Kit, the walker
// moved by pointer and keyboard, two revisions and their difference, a member reading it, and two
// riggers saving on the same revision. Gear names are the invented demo Kit's (seeds/02).

const figure = (page: Page, label: string) => page.locator(`dt:text-is("${label}") + dd`).first();
const section = (page: Page, title: string) => page.locator("details").filter({ has: page.locator("summary", { hasText: new RegExp(`^${title}`) }) });
const open = async (page: Page, title: string) => {
  const details = section(page, title);
  if ((await details.getAttribute("open")) === null) await details.locator("summary").click();
  return details;
};
const pick = (page: Page, label: string, option: RegExp) =>
  page
    .getByLabel(label, { exact: true })
    .locator("option", { hasText: option })
    .first()
    .textContent()
    .then((text) => page.getByLabel(label, { exact: true }).selectOption({ label: text! }));

async function createSite(page: Page): Promise<string> {
  await page.goto("/sites/new");
  await page.getByLabel("Site name").fill(`E2E notch ${Date.now()}`);
  await page.getByLabel("Horizontal span A to B (m)").fill("70");
  await page.getByLabel("Height of B above A (m)").fill("1");
  await page.getByLabel("Span uncertainty, ± (m)").fill("0.5");
  await page.getByLabel("Ground", { exact: true }).selectOption("profile");
  const points: [string, string][] = [
    ["0", "-5"],
    ["35", "-40"],
    ["70", "-3"],
  ];
  for (const [i, [x, h]] of points.entries()) {
    if (i > 0) await page.getByRole("button", { name: "Add a ground point" }).click();
    await page.getByLabel(`Ground point ${i + 1} distance from A (m)`).fill(x);
    await page.getByLabel(`Ground point ${i + 1} height (m)`).fill(h);
  }
  await page.getByLabel("Anchor A kind").selectOption("bolts");
  await page.getByLabel("Anchor A number of bolts").fill("2");
  await page.getByLabel("Anchor A bolt diameter (mm)").fill("12");
  await page.getByLabel("Anchor B trunk diameter (cm)").fill("60");
  await page.getByRole("button", { name: "Add the site" }).click();
  await expect(page.getByRole("heading", { name: "Ground under the line" })).toBeVisible();
  return page.url();
}

test("a rigger plans a rig on a new site from the Kit, moves the walker, saves twice and compares; a member reads it; a stale save keeps its edits", async ({
  page,
  browser,
}) => {
  test.setTimeout(180_000);
  await signInAs(page, "rigger", "/sites");
  await createSite(page);
  await expect(
    page.getByRole("img", { name: /Side view at true scale: span 70\.00 m, B 1\.00 m above A, the ground at its lowest 40\.00 m below A/ }),
  ).toBeVisible();
  await page.getByRole("link", { name: "Start a rig here" }).click();
  await expect(page.getByRole("heading", { name: "New rig" })).toBeVisible();
  await expect(page.getByLabel("Horizontal span A to B (m)")).toHaveValue("70");
  await expect(page.getByLabel("Horizontal span A to B (m)")).toHaveAttribute("readonly", "");

  // Gear from the Kit: its figures fill in and are marked as from the Kit.
  await pick(page, "Mainline from the Kit", /Tubular webbing 25/);
  await expect(page.getByLabel("Mainline MBS (kN)")).toHaveValue("32");
  await expect(page.getByLabel("Mainline MBS (kN)")).toHaveAttribute("readonly", "");
  await pick(page, "Backup from the Kit", /Tubular webbing 25/);
  await open(page, "Anchor A");
  await pick(page, "Anchor A component 1 from the Kit", /Round sling/);
  await pick(page, "Anchor A component 2 from the Kit", /Steel bow shackle/);
  await expect(page.getByLabel("Anchor A component 2 MBS (kN)")).toHaveValue("60");
  await open(page, "Tensioning");
  await pick(page, "Pulleys from the Kit", /Ball-bearing pulley/);
  await expect(page.getByLabel("Sheave efficiency (%)")).toHaveValue("93");
  await open(page, "Brake");
  await pick(page, "Brake from the Kit", /Toothed cam/);
  await pick(page, "Brake rope from the Kit", /Static rope 10\.5/);
  await expect(page.getByLabel("Rope diameter (mm)", { exact: true })).toHaveValue("10.5");
  await expect(page.getByRole("table", { name: /Slip tests of Toothed cam brake/ })).toContainText("7.40 kN");
  await expect(page.getByRole("region", { name: "Brake" })).toContainText("lowest measured slip of 7.40 kN");

  // Drag the walker with the mouse: the figures follow.
  const walkerHeading = page.getByRole("heading", { name: /^With the walker at/ });
  await expect(walkerHeading).toHaveText("With the walker at 35.00 m from A");
  const sliderBox = (await page.getByRole("slider", { name: "Walker position on the side view" }).boundingBox())!;
  const tensionA = await figure(page, "Tension at anchor A").textContent();
  await page.mouse.move(sliderBox.x + sliderBox.width / 2, sliderBox.y + sliderBox.height / 2);
  await page.mouse.down();
  await page.mouse.move(sliderBox.x + 30 + (sliderBox.width - 60) * 0.25, sliderBox.y + sliderBox.height / 2, { steps: 8 });
  await page.mouse.up();
  await expect(walkerHeading).toHaveText(/With the walker at 1[5-9]\.\d\d m from A/);
  await expect(figure(page, "Tension at anchor A")).not.toHaveText(tensionA!);
  await expect(page.getByLabel("Walker position from A, share of the span (%)")).toHaveValue(/^2\d/);

  // And with the keyboard: arrows move 1 % of the span, Page Up 10 %.
  await page.getByLabel("Walker position from A, share of the span (%)").fill("50");
  await expect(walkerHeading).toHaveText("With the walker at 35.00 m from A");
  await page.getByRole("slider", { name: "Walker position on the side view" }).focus();
  await page.keyboard.press("ArrowRight");
  await page.keyboard.press("ArrowRight");
  await page.keyboard.press("PageUp");
  await expect(walkerHeading).toHaveText("With the walker at 43.40 m from A");
  await expect(page.getByRole("slider", { name: /Walker position from A/ })).toHaveValue("62");

  // Save; then edit and save again.
  await page.getByLabel("Rig name").fill(`E2E notch line ${Date.now()}`);
  await page.getByRole("button", { name: "Save the rig" }).click();
  await expect(page).toHaveURL(/\/rigs\/[0-9a-f-]{36}$/);
  const rigUrl = page.url();
  await expect(page.getByText("Editing from revision 1 (draft).")).toBeVisible();
  await page.getByLabel("Pretension, nobody on the line (kN)").fill("4");
  await page.getByRole("button", { name: "Save as a new revision" }).click();
  await expect(page.getByText(/Saved as revision 2 \(draft\)/)).toBeVisible();
  const history = page.getByRole("region", { name: "Revision history" });
  await expect(history.getByRole("link", { name: "Revision 2" })).toBeVisible();
  await expect(history.getByRole("link", { name: "Revision 1" })).toBeVisible();
  const difference = history.getByRole("table", { name: "What changed from revision 1 to revision 2" });
  await expect(difference.getByRole("row", { name: /Pretension, nobody on the line/ })).toHaveText(/Pretension, nobody on the line\s*3\.5 kN\s*4 kN/);

  const serious = (await new AxeBuilder({ page }).analyze()).violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(" ")).join(", ")})`)).toEqual([]);

  // A member reads it: no saving, the inputs cannot be typed into.
  const memberContext = await browser.newContext();
  const member = await memberContext.newPage();
  await signInAs(member, "member", new URL(rigUrl).pathname);
  await expect(member.getByText(/Read only: moving the walker shows other positions but changes nothing/)).toBeVisible();
  await expect(member.getByRole("button", { name: /Save/ })).toHaveCount(0);
  await expect(member.getByLabel("Pretension, nobody on the line (kN)")).toBeDisabled();
  await memberContext.close();

  // Two riggers edit revision 2 at once: the first save lands, the second meets it and keeps its edits.
  const leadContext = await browser.newContext();
  const lead = await leadContext.newPage();
  await signInAs(lead, "lead", new URL(rigUrl).pathname);
  await expect(lead.getByText("Editing from revision 2 (draft).")).toBeVisible();
  await page.getByLabel("Walker mass (kg)").fill("90");
  await page.getByRole("button", { name: "Save as a new revision" }).click();
  await expect(page.getByText(/Saved as revision 3/)).toBeVisible();

  await lead.getByLabel("Pretension, nobody on the line (kN)").fill("4.5");
  await lead.getByRole("button", { name: "Save as a new revision" }).click();
  const conflict = lead.getByRole("alert").filter({ hasText: /Revision 3 was saved by .* while you edited/ });
  await expect(conflict).toBeVisible();
  await expect(conflict.getByRole("row", { name: /Walker mass/ })).toHaveText(/Walker mass\s*90 kg\s*75 kg/);
  await expect(conflict.getByRole("row", { name: /Pretension, nobody on the line/ })).toHaveText(/4 kN\s*4\.5 kN/);
  await expect(lead.getByLabel("Pretension, nobody on the line (kN)")).toHaveValue("4.5");
  await conflict.getByRole("button", { name: "Reapply my edits on revision 3" }).click();
  await expect(lead.getByLabel("Pretension, nobody on the line (kN)")).toHaveValue("4.5");
  await expect(lead.getByLabel("Walker mass (kg)")).toHaveValue("90");
  await lead.getByRole("button", { name: "Save as a new revision" }).click();
  await expect(lead.getByText(/Saved as revision 4/)).toBeVisible();
  await leadContext.close();
});
