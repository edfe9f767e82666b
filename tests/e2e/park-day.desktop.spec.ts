import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import { expect, test, type Browser, type Locator, type Page } from "@playwright/test";
import sharp from "sharp";
import { demo, shot, signInAs } from "./helpers";
import { htmlPartOf, linkIn, mailTo, readable, signUpAndProve } from "./mail-helpers";

/**
 * The park day, end to end, on a phone and on a desktop (the file name makes both projects run it):
 * a manager uploads a trail and invites a ranger, who joins and posts the morning check with a
 * closure and a hazard with a photo; a rider checks the board and the map, gets today's pressure
 * band for the open trails, and receives the closure notice by e-mail with a working unsubscribe.
 *
 * Everyone new is made fresh per run and project (unique e-mails and trail names), so the journey
 * can run again on the same database. Screenshots: .local/test-results/screens/park-day-*.png.
 */
const run = promisify(execFile);
const PARK = "harrow-ridge";
const TRAIL_FILE = path.resolve("tests/fixtures/trails/good-track.gpx");
const SURFACES = ["dry", "dusty", "tacky", "damp", "wet", "muddy", "loose", "rocky", "frozen", "snow"];
const HAZARD_TRAIL = "Slatebelt Flow";

const checkRow = (page: Page, name: string) => page.locator(`[data-testid="check-trail"][data-trail-name="${name}"]`);
const boardCard = (page: Page, name: string) => page.getByTestId("board-trail").filter({ has: page.getByRole("heading", { name, exact: true }) });

async function setSurfaces(card: Locator, wanted: string[]) {
  for (const surface of SURFACES) {
    const box = card.getByRole("checkbox", { name: surface, exact: true });
    if ((await box.isChecked()) !== wanted.includes(surface)) await box.setChecked(wanted.includes(surface));
  }
}

async function newPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ ...test.info().project.use });
  return context.newPage();
}

test("the park day: upload, invite, check with a closure and a hazard, board and map, pressure, closure e-mail", async ({ page: manager, browser }) => {
  test.setTimeout(240_000);
  const tag = `${test.info().project.name}-${Date.now().toString(36)}`;
  const trailName = `Fernbrake ${tag}`;
  const rangerEmail = `ranger-${tag}@tests.loamcast.test`;
  const riderEmail = `rider-${tag}@tests.loamcast.test`;
  const rangerPassword = "moss-on-the-boardwalk-31";
  const riderPassword = "first-chair-fog-lifting-27";
  const reason = "Soft after the overnight rain; the new berms need a day to firm up";
  const hazardNote = `Fallen alder across the second berm (${tag}), walk around on the left`;

  // 1. The manager uploads a trail file and invites a ranger; the ranger joins by the e-mailed link.
  await signInAs(manager, demo("manager"), undefined, `/staff/${PARK}/trails/new`);
  await expect(manager.getByRole("heading", { name: "Upload a trail" })).toBeVisible();
  await manager.getByTestId("trail-file").setInputFiles(TRAIL_FILE);
  await expect(manager.getByTestId("upload-preview").getByTestId("figure-length")).toContainText(/\d km|\d m/);
  await manager.getByLabel("Trail name").fill(trailName);
  await manager.getByLabel("Kind").selectOption("flow");
  await shot(manager, "park-day-1-upload-preview");
  await manager.getByRole("button", { name: "Save trail" }).click();
  await expect(manager).toHaveURL(/\/trails\/[0-9a-f-]{36}$/);
  await expect(manager.getByRole("heading", { level: 1, name: trailName })).toBeVisible();
  const trailId = manager.url().split("/").at(-1)!;

  await manager.goto(`/staff/${PARK}`);
  await manager.getByLabel("Their e-mail").fill(rangerEmail);
  await manager.getByRole("radio", { name: "Ranger" }).check();
  await manager.getByRole("button", { name: "Send invitation" }).click();
  await expect(manager.getByText(`Invitation sent to ${rangerEmail}.`)).toBeVisible();
  await shot(manager, "park-day-2-invitation-sent");

  const invitation = (await mailTo(rangerEmail)).at(-1)!;
  expect(readable(invitation.raw)).toContain("invited you to join Harrow Ridge Bike Park");
  const invitationLink = /https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]+/.exec(readable(invitation.raw))![0];
  const ranger = await newPage(browser);
  await ranger.goto(invitationLink);
  await expect(ranger.getByRole("heading", { name: "Join Harrow Ridge Bike Park" })).toBeVisible();
  await ranger.getByLabel("Your name").fill("Ines Switchback");
  await ranger.getByLabel("Choose a password").fill(rangerPassword);
  await shot(ranger, "park-day-3-ranger-joins");
  await ranger.getByRole("button", { name: "Join the team" }).click();
  await expect(ranger).toHaveURL(/\/sign-in\?joined=1/);
  await signInAs(ranger, rangerEmail, rangerPassword, `/staff/${PARK}/morning-check`);

  // 2. The morning check: the new trail closed after rain, every other trail open with its surfaces.
  await ranger.goto(`/staff/${PARK}/morning-check`);
  await expect(ranger.getByRole("heading", { name: "Morning check" })).toBeVisible();
  const closed = checkRow(ranger, trailName);
  await closed.getByRole("button", { name: "Change", exact: true }).click();
  await closed.getByRole("radio", { name: "Closed" }).click();
  await closed.getByLabel("Reason (closed)").fill(reason);
  await setSurfaces(closed, ["wet", "muddy"]);
  const names = await ranger.getByTestId("check-trail").evaluateAll((cards) => cards.map((c) => c.getAttribute("data-trail-name")!));
  const others = names.filter((n) => n !== trailName);
  expect(others.length).toBeGreaterThanOrEqual(10);
  for (const name of others) {
    const card = checkRow(ranger, name);
    await card.getByRole("button", { name: "Change", exact: true }).click();
    await card.getByRole("radio", { name: "Open" }).click();
    await setSurfaces(card, name === HAZARD_TRAIL ? ["damp", "rocky"] : ["tacky", "damp"]);
  }
  await expect(ranger.getByTestId("check-count")).toContainText(`${names.length} marked now`);
  await shot(ranger, "park-day-4-check-marked");
  await ranger.getByRole("button", { name: `Save ${names.length} trails` }).click();
  await expect(ranger.getByTestId("check-outcome")).toContainText(`Saved ${names.length} trails.`);
  const noticeLink = ranger.getByRole("link", { name: "Send a closure notice to riders" });
  const noticeHref = (await noticeLink.getAttribute("href"))!;
  expect(noticeHref).toContain(`trailIds=${trailId}`);

  // The hazard, by coordinates (the form has no map picker): a point on the trail's own line.
  const { features } = await (await ranger.request.get(`/api/parks/${PARK}/trails.geojson`)).json();
  const hazardTrail = features.find((f: { properties: { name: string } }) => f.properties.name === HAZARD_TRAIL);
  const line: number[][] = hazardTrail.geometry.type === "LineString" ? hazardTrail.geometry.coordinates : hazardTrail.geometry.coordinates[0];
  const [lon, lat] = line[Math.floor(line.length / 2)];
  await ranger.goto(`/staff/${PARK}/hazards`);
  await ranger.getByRole("radio", { name: "Fallen tree" }).check();
  await ranger.getByLabel("Trail (optional)").selectOption(hazardTrail.properties.id);
  await ranger.getByLabel("Latitude").fill(lat.toFixed(6));
  await ranger.getByLabel("Longitude").fill(lon.toFixed(6));
  await ranger.getByLabel("Note").fill(hazardNote);
  const photo = await sharp({ create: { width: 800, height: 600, channels: 3, background: "#5d4a2f" } })
    .composite([{ input: Buffer.from('<svg width="800" height="600"><rect x="120" y="260" width="560" height="60" rx="30" fill="#2f2418"/></svg>'), top: 0, left: 0 }])
    .jpeg({ quality: 80 })
    .toBuffer();
  await ranger.getByLabel(/^Photos/).setInputFiles({ name: "alder.jpg", mimeType: "image/jpeg", buffer: photo });
  await shot(ranger, "park-day-5-hazard-form");
  await ranger.getByRole("button", { name: "Pin the hazard" }).click();
  await expect(ranger.getByTestId("hazard-result")).toHaveText("Hazard pinned. It is on the public board now.");

  // 3. A rider (new account) checks the board and the map before driving up.
  const rider = await newPage(browser);
  await signUpAndProve(rider, { name: "Remy Lowgear", email: riderEmail, password: riderPassword });
  await signInAs(rider, riderEmail, riderPassword, `/parks/${PARK}`);
  await rider.goto(`/parks/${PARK}`);
  const closedCard = boardCard(rider, trailName);
  await expect(closedCard.locator('[data-status="closed"]')).toBeVisible();
  await expect(closedCard).toContainText(reason);
  await expect(closedCard.getByTestId("inspected")).toHaveText(/^Inspected \d{2}:\d{2}$/);
  const hazardCard = boardCard(rider, HAZARD_TRAIL);
  await expect(hazardCard.locator('[data-status="open"]')).toBeVisible();
  await expect(hazardCard.getByTestId("inspected")).toHaveText(/^Inspected \d{2}:\d{2}$/);
  await hazardCard.getByTestId("hazard-count").click();
  const pinned = hazardCard.getByTestId("hazard").filter({ hasText: hazardNote });
  await expect(pinned).toBeVisible();
  const thumb = pinned.getByRole("img", { name: /Photo 1 of the fallen tree/ });
  await thumb.scrollIntoViewIfNeeded(); // thumbnails load lazily
  await expect.poll(() => thumb.evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBe(320);
  await closedCard.scrollIntoViewIfNeeded();
  await shot(rider, "park-day-6-board");

  await rider.getByRole("link", { name: "Map", exact: true }).click();
  await expect(rider.locator("[data-testid=park-map][data-map-state=idle]")).toBeVisible({ timeout: 30_000 });
  const list = rider.getByTestId("trail-text-list");
  const row = list.locator(`[data-trail-row="${trailId}"]`);
  await expect(row.locator('[data-status="closed"]')).toHaveText("Closed");
  await expect(row).toContainText(/last inspected today \d{2}:\d{2}/);
  await expect(list.getByRole("listitem").filter({ hasText: hazardNote })).toContainText(`Fallen tree on ${HAZARD_TRAIL}: ${hazardNote}`);
  await shot(rider, "park-day-7-map");

  // 4. Today's pressure for the open trails, from a saved setup with a baseline.
  const wheel = { bsdMm: 622, widthMm: 61, casing: "trail", insert: false, tubeless: true, maxKpa: 345, rimMaxKpa: 303 };
  const saved = await rider.request.post("/api/me/setups", {
    data: { name: `Enduro 29 ${tag}`, riderMassKg: 74, bikeMassKg: 16.2, pace: "steady", front: wheel, rear: wheel, baseline: { frontKpa: 145, rearKpa: 165, surfaces: ["dry"], temperatureC: 15 } },
  });
  expect(saved.status()).toBe(201);
  await rider.goto(`/pressure?park=${PARK}`);
  await expect(rider.getByRole("radio", { name: new RegExp(`Enduro 29 ${tag}`) })).toBeChecked();
  await expect(rider.getByLabel(trailName)).not.toBeChecked();
  await expect(rider.getByLabel(HAZARD_TRAIL)).toBeChecked();
  await rider.getByRole("button", { name: "Show my pressure band" }).click();
  const result = rider.getByTestId("band-result");
  await expect(result).toContainText("Starting from your baseline.");
  await expect(result).toContainText(`Harrow Ridge Bike Park, ${others.length} trails.`);
  for (const wheelCard of ["band-front", "band-rear"]) {
    await expect(rider.getByTestId(wheelCard)).toContainText(/\d+\.\d psi/);
    await expect(rider.getByTestId(wheelCard)).toContainText("Pump to now");
  }
  await expect(rider.getByTestId("reasons").locator("tr[data-reason=basis-baseline]")).toContainText("Your baseline");
  const cautions = rider.getByTestId("cautions");
  await expect(cautions).toContainText("Never go above the tyre's or the rim's printed maximum pressure");
  await expect(cautions).toContainText("Follow park signage, closures and staff instructions.");
  await shot(rider, "park-day-8-pressure");

  // 5. The rider subscribes and confirms; staff send the closure; the worker mails it.
  await rider.goto(`/me/subscriptions?park=${PARK}`);
  await rider.getByRole("button", { name: "Send me these e-mails" }).click();
  await expect(rider.getByRole("status")).toContainText(`open the link we just sent to ${riderEmail}`);
  const confirmLink = linkIn((await mailTo(riderEmail)).at(-1)!.raw, "/api/subscriptions/confirm")!;
  await rider.goto(confirmLink);
  await expect(rider.getByTestId("confirm-done")).toContainText("You will get notices from Harrow Ridge Bike Park");

  await ranger.goto(noticeHref);
  await expect(ranger.getByLabel("Closure", { exact: true })).toBeChecked();
  await expect(ranger.getByLabel("Message to riders")).toHaveValue(new RegExp(`${trailName} is closed: ${reason}`));
  await ranger.getByRole("button", { name: "Preview the e-mail" }).click();
  const preview = ranger.getByTestId("notice-preview");
  await expect(preview).toContainText(`Subject: Harrow Ridge Bike Park: ${trailName} closed`);
  await shot(ranger, "park-day-9-notice-preview");
  await preview.getByRole("button", { name: /^Send to \d+ riders?$/ }).click();
  await expect(ranger.getByTestId("sending-banner")).toContainText("Sending to");

  const worker = await run("node_modules/.bin/tsx", ["--conditions=react-server", "scripts/worker.ts", "--once"], { env: process.env, timeout: 60_000 });
  expect(worker.stdout).toMatch(/done: \d+ sent/);
  const notices = (await mailTo(riderEmail)).filter((m) => readable(m.raw).includes(`Subject: Harrow Ridge Bike Park: ${trailName} closed`));
  expect(notices).toHaveLength(1);
  expect(readable(notices[0].raw)).toContain(reason);
  expect(readable(notices[0].raw)).toMatch(/^List-Unsubscribe-Post: List-Unsubscribe=One-Click\r?$/m);
  expect(linkIn(notices[0].raw, "/unsubscribe")).toMatch(/\/unsubscribe\?token=/);

  // The e-mail as a mail app shows it, on this screen size; its link works with no session at all.
  const html = htmlPartOf(notices[0].raw)!;
  expect(html).toContain(reason);
  const inbox = await newPage(browser);
  await inbox.setContent(html);
  // Laid out at the screen's width, not at a desktop width shrunk to fit (which makes it unreadable on a phone).
  expect(await inbox.evaluate(() => [window.innerWidth, document.documentElement.scrollWidth])).toEqual([inbox.viewportSize()!.width, inbox.viewportSize()!.width]);
  await shot(inbox, "park-day-10-closure-email");
  await inbox.getByRole("link", { name: "Stop these e-mails" }).click();
  await expect(inbox.getByRole("heading", { name: "Stop notices from Harrow Ridge Bike Park?" })).toBeVisible();
  await inbox.getByRole("button", { name: "Stop these e-mails" }).click();
  await expect(inbox.getByTestId("unsubscribe-done")).toContainText("You are unsubscribed");
  await shot(inbox, "park-day-11-unsubscribed");
  await rider.goto("/me/subscriptions");
  await expect(rider.getByTestId("subscription-harrow-ridge")).toContainText("Stopped");
});
