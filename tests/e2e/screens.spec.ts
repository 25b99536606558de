import { test, expect, type Page } from "@playwright/test";
import { signInAs } from "./support/sign-in";

// The screens issue 9 asked to fix, at desk (1280 wide) and phone (390 wide) width, each screenshot kept for
// a person to look at (in .data/, out of the repository) and each fix held by an assertion.
const WIDTHS = [
  { name: "desk", width: 1280, height: 900 },
  { name: "phone", width: 390, height: 844 },
] as const;

const CREW_SETTINGS = {
  minSafetyFactors: { webbing: 3, rope: 3, anchor: 3, connector: 3, sling: 3, pulley: 3, brake: 3 },
  minClearanceM: 2,
  allowSelfSignOff: false,
};
/** Sets the demo crew's units through the settings route (an owner's or lead's session). */
const setCrewUnits = (page: Page, units: "si" | "us") =>
  page.evaluate(
    (body) =>
      fetch("/api/crew/settings", { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify(body) }).then((r) => r.status),
    { units, ...CREW_SETTINGS },
  );

const shot = (page: Page, name: string, width: string) => page.screenshot({ path: `.data/test/playwright/screens/${name}-${width}.png`, fullPage: true });

for (const size of WIDTHS) {
  test.describe(`at ${size.name} width`, () => {
    test.use({ viewport: { width: size.width, height: size.height } });

    test("a member: the section tabs all in view, the Kit's tables, a rigger's page, a missing page", async ({ page }) => {
      await signInAs(page, "member", "/kit");
      const crewTab = page.getByRole("navigation", { name: "Sections" }).getByRole("link", { name: "Crew" });
      const box = (await crewTab.boundingBox())!;
      expect(box.x + box.width).toBeLessThanOrEqual(size.width);
      if (size.name === "phone") await expect(page.getByText("More columns: scroll sideways →").first()).toBeVisible();
      await expect(page.getByRole("complementary", { name: "Safety cautions" })).toHaveCount(0);
      await shot(page, "kit", size.name);

      await page.goto("/kit/new");
      await expect(page.getByRole("heading", { name: "This page needs a rigger" })).toBeVisible();
      await expect(page.getByText("Only riggers, leads and owners may add and change gear in the Kit; you are a member of")).toBeVisible();
      await shot(page, "kit-new-member", size.name);

      const missing = await page.goto("/kit/items/4c2e8c1e-7a4d-4c2e-9b1f-0d6e5a4c3b2a");
      expect(missing?.status()).toBe(404);
      await expect(page.getByRole("heading", { name: "Nothing at this address" })).toBeVisible();
      await shot(page, "not-found", size.name);
    });

    test("a rigger: a retired item, a model's specs, the slip bench and a slip test", async ({ page }) => {
      await signInAs(page, "rigger", "/kit");
      await page.getByRole("link", { name: "FW-old" }).click();
      await expect(page.getByText("Retired on 2026-08-30: Edge abrasion after a sharp-rock anchor. It cannot be put in a new plan")).toBeVisible();
      await expect(page.getByRole("button", { name: "Record inspection" })).toHaveCount(0);
      await shot(page, "retired-item", size.name);

      await page.goto("/kit");
      await page.getByRole("link", { name: "Tubular webbing 25 mm" }).click();
      await expect(page.getByRole("heading", { level: 1, name: "Tubular webbing 25 mm" })).toBeVisible();
      await expect(page.locator("dl").getByText("32.00 kN", { exact: true })).toBeVisible();
      await shot(page, "model", size.name);

      await page.goto("/slip-bench");
      await expect(page.getByRole("complementary", { name: "Safety cautions" })).toHaveCount(0);
      await expect(page.getByText(/Slip loads vary with rope wear/)).toBeVisible();
      await shot(page, "slip-bench", size.name);

      await page.getByRole("row").filter({ hasText: "confirmed" }).first().getByRole("link").click();
      await expect(page.getByText(/counting as a slip any fall of more than 0\.20 kN below the running maximum/)).toBeVisible();
      await shot(page, "slip-test", size.name);

      await page.goto("/slip-bench/new");
      await page.getByLabel("Trace file (CSV)").setInputFiles({ name: "force-only.csv", mimeType: "text/csv", buffer: Buffer.from("force (N)\n0\n10\n20\n") });
      await page.getByLabel("Force unit of the trace").selectOption("N");
      await page.getByRole("button", { name: "Read trace" }).click();
      await expect(page.getByText('The header "force (N)" has only a force column: a trace needs a time column (in seconds) beside it.')).toBeVisible();
      await shot(page, "trace-without-time", size.name);
    });

    test("an owner: the only owner told why before leaving, devices named in words, a member not invited again", async ({ page }) => {
      await signInAs(page, "owner", "/crew");
      await expect(page.getByText("You are the crew's only owner: make someone else an owner before you leave or step down.")).toBeVisible();
      await page.getByLabel("E-mail to invite").fill("tove@greyrock.example");
      await page.getByRole("button", { name: "Send invitation" }).click();
      await expect(page.getByText(/Tove Harlan \(tove@greyrock\.example\) is already in Greyrock Highline Collective, as a member/)).toBeVisible();
      await expect(page.getByText("Nothing was saved: each field marked below says what to change.")).toBeVisible();
      await shot(page, "crew-owner", size.name);

      await page.goto("/account");
      await expect(page.getByRole("table", { name: "Devices signed in to your account" })).toContainText(/Chrome \d+ on .*\(this device\)/);
      await shot(page, "account", size.name);
    });

    test("a lead: the slip table's one-time link with a copy button, and the Kit in US units", async ({ page, context }) => {
      await context.grantPermissions(["clipboard-read", "clipboard-write"]);
      await signInAs(page, "lead", "/slip-bench");
      await page.getByRole("button", { name: /Publish a (new|read-only) link/ }).click();
      await page.getByRole("button", { name: "Copy the link" }).click();
      await expect(page.getByRole("status").filter({ hasText: "Copied." })).toBeVisible();
      const link = (await page.locator("code").filter({ hasText: "/shared/slip-table/" }).textContent())!;
      expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(link);
      await shot(page, "share-link", size.name);
      await page.getByRole("button", { name: "Revoke the link" }).click();

      const setUnits = (units: "si" | "us") => setCrewUnits(page, units);
      expect(await setUnits("us")).toBe(200);
      try {
        await page.goto("/kit");
        await page.getByRole("link", { name: "Tubular webbing 25 mm" }).click();
        await expect(page.getByRole("heading", { level: 1, name: "Tubular webbing 25 mm" })).toBeVisible();
        // 32 kN = 7193.9 lbf, cut down; the 1 kN stretch point = 224.8 lbf, to the whole lbf (NIST SP 811).
        const specs = page.locator("dl");
        await expect(specs.getByText("7193 lbf", { exact: true })).toBeVisible();
        await expect(specs.getByText("Mass per foot", { exact: true })).toBeVisible();
        await expect(specs.getByRole("cell", { name: "225", exact: true })).toBeVisible();
        await shot(page, "model-us", size.name);
        await page.getByRole("link", { name: "Edit specs" }).click();
        await expect(page.getByLabel("MBS (lbf)")).toHaveValue("7193");
        await expect(page.getByLabel("Mass per foot (oz/ft)")).toHaveValue("0.52");
        await page.getByLabel("MBS (lbf)").fill("90000");
        await page.getByRole("button", { name: "Save changes" }).click();
        await expect(page.getByText("MBS must be at most 67400 lbf (allowed 113–67400 lbf).")).toBeVisible();
        await shot(page, "model-edit-us", size.name);
        await page.goto("/slip-bench");
        await expect(page.locator('[data-cell="Rope line grip 11.0"]')).toContainText("966 lbf");
        await shot(page, "slip-bench-us", size.name);
      } finally {
        expect(await setUnits("si")).toBe(200);
      }
    });

    test("a lead: a rig in US units, its brake sentence, warnings, Kit-filled boxes and labels in the crew's units", async ({ page }) => {
      await signInAs(page, "lead", "/rigs");
      expect(await setCrewUnits(page, "us")).toBe(200);
      try {
        await page.getByRole("link", { name: "Corvid Gorge highline" }).first().click();
        const brake = page.getByRole("region", { name: "Brake" });
        await expect(brake).toContainText("lbf at the brake");
        await expect(brake).not.toContainText("kN");
        await expect(page.locator("#warnings")).not.toContainText(/\d kN|\d m\b/);
        const details = page.locator("details").filter({ has: page.locator("summary", { hasText: /^Mainline/ }) });
        if ((await details.getAttribute("open")) === null) await details.locator("summary").click();
        await expect(page.getByLabel("Mainline mass per foot (oz/ft)")).toBeVisible();
        // Boxes filled from the Kit read as the Kit does: whole lbf (NIST SP 811: 1 lbf = 4.448 221 615 260 5 N), never 449.618.
        for (const box of await page.getByLabel(/^Mainline stretch point \d+ tension \(lbf\)$/).all()) await expect(box).toHaveValue(/^\d+$/);
        await shot(page, "rig-us", size.name);
        await details.screenshot({ path: `.data/test/playwright/screens/rig-us-mainline-${size.name}.png` });
        await brake.screenshot({ path: `.data/test/playwright/screens/rig-us-brake-${size.name}.png` });
      } finally {
        expect(await setCrewUnits(page, "si")).toBe(200);
      }
    });
  });
}
