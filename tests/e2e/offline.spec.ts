import { test, expect, type APIRequestContext, type Browser, type BrowserContext, type Page } from "@playwright/test";
import example from "../../physics/examples/quarry-highline.json";
import { signInAs } from "./support/sign-in";

// On site with no signal: a member opens a signed-off rig at home, the phone keeps it (service worker and
// IndexedDB), the browser context goes offline, and the rig, its card and its checklist still work; ticks
// and readings made offline wait and land once when the signal returns. People are the invented demo crew.

test.use({ serviceWorkers: "allow" });
// Kept for people to look at, beside the other screens' shots.
const SCREENS = ".data/test/playwright/screens";

interface Rig {
  rigId: string;
  revisionId: string;
}

async function post(request: APIRequestContext, baseURL: string, url: string, data: object) {
  const response = await request.post(url, { data, headers: { origin: baseURL } });
  return { status: response.status(), body: await response.json() };
}

/** A rig saved by the demo rigger and signed off by the demo lead, through the API the pages use. */
async function signedOffRig(browser: Browser, baseURL: string, name: string) {
  const rigger = await (await browser.newContext()).newPage();
  await signInAs(rigger, "rigger");
  const lead = await (await browser.newContext()).newPage();
  await signInAs(lead, "lead");
  const created = await post(rigger.request, baseURL, "/api/rigs", { name, siteId: null, inputs: example });
  expect(created.status).toBe(201);
  const rig: Rig = { rigId: created.body.rig.id, revisionId: created.body.revision.id };
  const review = `/api/rigs/${rig.rigId}/revisions/${rig.revisionId}/review`;
  expect((await post(rigger.request, baseURL, review, { step: "submit", note: "" })).status).toBe(200);
  expect((await post(lead.request, baseURL, review, { step: "sign", confirm: true })).status).toBe(200);
  return { rig, rigger, lead };
}

/** The member opens the rig online, waits until this phone keeps it, and starts the checklist (which needs the server). */
async function keepOnPhone(browser: Browser, rig: Rig): Promise<{ context: BrowserContext; member: Page }> {
  const context = await browser.newContext();
  const member = await context.newPage();
  await signInAs(member, "member");
  await member.goto(`/rigs/${rig.rigId}`);
  await expect(member.getByTestId("offline-keeping")).toContainText("Kept on this phone for offline use, last synced", { timeout: 60_000 });
  await member.getByRole("button", { name: "Start the checklist" }).click();
  await expect(member.getByRole("checkbox", { name: /^Anchors as planned/ })).toBeEnabled();
  // The run just started is read again from the server, and so kept with the rig's other data.
  await member.reload();
  await expect(member.getByRole("checkbox", { name: /^Anchors as planned/ })).toBeEnabled();
  return { context, member };
}

test("a signed-off rig opened online is read, shown as a card and worked offline; its writes land once", async ({ browser, baseURL }) => {
  test.setTimeout(240_000);
  const name = `E2E offline ${Date.now()}`;
  const { rig } = await signedOffRig(browser, baseURL!, name);
  const { context, member } = await keepOnPhone(browser, rig);
  const sent: { url: string; body: string }[] = [];
  member.on("request", (request) => {
    if (request.method() === "POST" && /\/(ticks|readings)$/.test(request.url()))
      sent.push({ url: new URL(request.url()).pathname, body: request.postData()! });
  });

  await context.setOffline(true);
  await member.reload();
  await expect(member.getByRole("heading", { name })).toBeVisible();
  // The figures are worked out again in this browser by the same engine: nothing reaches a server.
  await expect(member.getByRole("table", { name: "Safety factors" })).toContainText("Passes");
  await expect(member.getByRole("region", { name: "Brake" })).toContainText("Holds");
  const desk = member.viewportSize()!;
  await member.setViewportSize({ width: 390, height: 844 });
  await member.screenshot({ path: `${SCREENS}/offline-rig-phone.png` });
  await member.setViewportSize(desk);

  const first = member.getByRole("checkbox", { name: /^Anchors as planned/ });
  await first.click();
  await expect(member.getByText("Ticked on this phone, waiting to sync")).toBeVisible();
  await member.getByLabel("Tension read (kN)").fill("3.4");
  await member.getByLabel("Sag measured at mid-span (m)").fill("1.3");
  await member.getByRole("button", { name: "Record the reading" }).click();
  await expect(member.getByRole("list", { name: "Readings waiting to sync" })).toContainText("3.40 kN");
  const status = member.getByTestId("connection-status");
  await expect(status).toContainText("Offline");
  await expect(status).toContainText("2 writes waiting to sync");

  // The rig card, as printed, from this phone's copy.
  await member.goto(`/rigs/${rig.rigId}/card?revision=${rig.revisionId}`);
  await expect(member.getByRole("heading", { name: new RegExp(name) }).first()).toBeVisible();
  // A page never opened here says what works offline instead of failing.
  await member.goto("/kit");
  await expect(member.getByRole("heading", { name: "Working offline" })).toBeVisible();
  await expect(member.getByRole("link", { name })).toBeVisible();
  await expect(member.getByText(/Tick .*Anchors as planned/)).toBeVisible();
  await member.screenshot({ path: `${SCREENS}/offline-page-desk.png`, fullPage: true });

  await context.setOffline(false);
  await member.goto(`/rigs/${rig.rigId}`);
  await expect(status).toContainText("Online", { timeout: 45_000 });
  await expect(status).not.toContainText("waiting to sync", { timeout: 45_000 });
  await member.reload();
  await expect(first).toBeChecked();
  await expect(member.getByText(/Ticked by Tove Harlan/)).toBeVisible();
  // The waiting writes are sent one after another: the reading lands just after the tick shows.
  const readingsPath = `/api/rigs/${rig.rigId}/revisions/${rig.revisionId}/readings`;
  await expect.poll(async () => (await (await member.request.get(readingsPath)).json()).readings.length).toBe(1);
  const log = member.getByRole("region", { name: "What happened" });
  await expect(log.getByText("Ticked: Anchors as planned")).toHaveCount(1);

  // Each write was tried while offline and again once online, always with the same body and key: two writes.
  const writes = [...new Map(sent.map((s) => [s.body, s])).values()];
  expect(writes.map((s) => s.url.split("/").pop())).toEqual(["ticks", "readings"]);
  // The same replay sent twice more changes nothing: each answers 200 "replayed".
  for (const { url, body } of [...writes, ...writes]) {
    const replay = await post(member.request, baseURL!, url, JSON.parse(body));
    expect(replay).toMatchObject({ status: 200, body: { replayed: true } });
  }
  expect((await (await member.request.get(readingsPath)).json()).readings).toHaveLength(1);
  await member.reload();
  await expect(log.getByText("Ticked: Anchors as planned")).toHaveCount(1);
});

test("a write the server refuses on replay is shown with its reason and kept until the member discards it", async ({ browser, baseURL }) => {
  test.setTimeout(240_000);
  const name = `E2E offline refused ${Date.now()}`;
  const { rig, rigger, lead } = await signedOffRig(browser, baseURL!, name);
  const { context, member } = await keepOnPhone(browser, rig);

  await context.setOffline(true);
  await member.reload();
  await member.getByRole("checkbox", { name: /^Anchors as planned/ }).click();
  await expect(member.getByText("Ticked on this phone, waiting to sync")).toBeVisible();

  // Meanwhile, with signal, the crew signs off a newer revision: the one the member ticked is superseded.
  const saved = await post(rigger.request, baseURL!, `/api/rigs/${rig.rigId}/revisions`, {
    basedOnRevisionId: rig.revisionId,
    name,
    siteId: null,
    inputs: example,
  });
  expect(saved.status).toBe(201);
  const review = `/api/rigs/${rig.rigId}/revisions/${saved.body.revision.id}/review`;
  expect((await post(rigger.request, baseURL!, review, { step: "submit", note: "" })).status).toBe(200);
  expect((await post(lead.request, baseURL!, review, { step: "sign", confirm: true })).status).toBe(200);

  await context.setOffline(false);
  await member.goto("/offline");
  const status = member.getByTestId("connection-status");
  await expect(status).toContainText("1 refused by the server", { timeout: 45_000 });
  const refused = member.getByTestId("refused-write");
  await expect(refused).toContainText(/Tick .*Anchors as planned/);
  await expect(refused).toContainText("Revision 1 has been superseded by a newer sign-off: tick the checklist on the signed-off revision.");
  await member.reload();
  await expect(refused).toHaveCount(1);
  await refused.getByRole("button", { name: "Discard" }).click();
  await expect(refused).toHaveCount(0);
  await expect(status).not.toContainText("refused");
});
