import { expect, test, type Locator, type Page } from "@playwright/test";
import sharp from "sharp";
import { demo, shot, signInAs } from "./helpers";

const BOARD = "/parks/harrow-ridge";

const checkRow = (page: Page, name: string) => page.locator(`[data-testid="check-trail"][data-trail-name="${name}"]`);
const boardCard = (page: Page, name: string) => page.getByTestId("board-trail").filter({ has: page.getByRole("heading", { name, exact: true }) });

async function setSurfaces(card: Locator, wanted: string[]) {
  for (const surface of ["dry", "dusty", "tacky", "damp", "wet", "muddy", "loose", "rocky", "frozen", "snow"]) {
    await card.getByRole("checkbox", { name: surface, exact: true }).setChecked(wanted.includes(surface));
  }
}

test.describe.configure({ mode: "serial" });

test("a rider reads the board without signing in; filters are plain links", async ({ page, request }) => {
  await page.goto(BOARD);
  await expect(page.getByRole("heading", { level: 1, name: "Harrow Ridge Bike Park" })).toBeVisible();
  await expect(page.getByTestId("board-trail")).toHaveCount(10);
  await expect(page.getByRole("link", { name: "Map", exact: true })).toHaveAttribute("href", `${BOARD}/map`);
  await expect(page.getByTestId("inspected-count")).toContainText("of 10 trails inspected today");
  await shot(page, "board-rider");

  // No map library on the board: none of its scripts carries MapLibre.
  const scripts = await page.locator("script[src]").evaluateAll((nodes) => nodes.map((n) => (n as HTMLScriptElement).src));
  for (const src of scripts) expect(await (await request.get(src)).text()).not.toContain("maplibre");

  await page.getByText("Filter trails").click();
  await page.getByRole("navigation", { name: "Filter trails" }).getByRole("link", { name: "Extremely difficult" }).click();
  await expect(page).toHaveURL(/difficulty=extreme/);
  await expect(page.getByTestId("board-trail")).toHaveCount(2);
  await page.getByRole("navigation", { name: "Filter trails" }).getByRole("link", { name: "Jump line" }).click();
  await expect(page).toHaveURL(/\?difficulty=extreme&kind=jump$/);
  await expect(page.getByText("No trail matches these filters.")).toBeVisible();
  await page.goto(`${BOARD}?kind=jump`);
  await expect(page.getByTestId("board-trail")).toHaveCount(1);
  await expect(boardCard(page, "Tumblewire")).toBeVisible();
});

test("the board filters without JavaScript too", async ({ browser }) => {
  const context = await browser.newContext({ javaScriptEnabled: false });
  const page = await context.newPage();
  await page.goto(`${BOARD}?difficulty=intermediate`);
  await expect(page.getByTestId("board-trail")).toHaveCount(3);
  await context.close();
});

test("the ranger runs the morning check on a phone: one closure after rain, others open; the board shows it", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, "/staff/harrow-ridge/morning-check");
  await page.goto("/staff/harrow-ridge/morning-check");
  await expect(page.getByRole("heading", { name: "Morning check" })).toBeVisible();
  await expect(page.getByTestId("check-trail")).toHaveCount(10);

  const gnarlroot = checkRow(page, "Gnarlroot");
  await gnarlroot.getByRole("button", { name: "Change", exact: true }).click();
  await gnarlroot.getByRole("radio", { name: "Closed" }).click();
  await gnarlroot.getByLabel("Reason (closed)").fill("Saturated after the night's rain");
  await setSurfaces(gnarlroot, ["wet", "muddy"]);

  for (const name of ["Mossback Ramble", "Cedar Skip"]) {
    const card = checkRow(page, name);
    await card.getByRole("button", { name: "Change", exact: true }).click();
    // A tap on the status, even the one already shown, marks the trail checked.
    await card.getByRole("radio", { name: "Open" }).click();
    await setSurfaces(card, ["tacky", "damp"]);
  }
  await checkRow(page, "Tumblewire").getByRole("button", { name: "Unchanged" }).click();
  await expect(checkRow(page, "Tumblewire").getByTestId("mode")).toHaveText("Unchanged");

  // With the keyboard: arrow keys move through the status buttons.
  const slatebelt = checkRow(page, "Slatebelt Flow");
  await slatebelt.getByRole("button", { name: "Change", exact: true }).click();
  await slatebelt.getByRole("radio", { name: "Open" }).click();
  await slatebelt.getByRole("radio", { name: "Open" }).focus();
  await page.keyboard.press("ArrowRight");
  await expect(slatebelt.getByRole("radio", { name: "Caution" })).toBeChecked();
  await slatebelt.getByLabel("Reason (caution)").fill("Boardwalk slick until midday");

  await expect(page.getByTestId("check-count")).toContainText("5 marked now");
  await shot(page, "check-marked-by-hand");
  await page.getByRole("button", { name: "Save 5 trails" }).click();
  await expect(page.getByTestId("check-outcome")).toContainText("Saved 5 trails.");
  const notice = page.getByRole("link", { name: "Send a closure notice to riders" });
  await expect(notice).toHaveAttribute("href", /^\/staff\/harrow-ridge\/notices\/new\?kind=closure&trailIds=[0-9a-f-]{36}&message=.*Gnarlroot/);
  await shot(page, "check-saved");

  await page.goto(BOARD);
  const card = boardCard(page, "Gnarlroot");
  await expect(card.locator('[data-status="closed"]')).toBeVisible();
  await expect(card).toContainText("Saturated after the night's rain");
  await expect(card.getByTestId("inspected")).toHaveText(/^Inspected \d{2}:\d{2}$/);
  await expect(boardCard(page, "Slatebelt Flow").locator('[data-status="caution"]')).toBeVisible();
  await shot(page, "board-after-check");

  await page.goto(`${BOARD}?status=closed`);
  await expect(boardCard(page, "Gnarlroot")).toBeVisible();
  for (const status of await page.getByTestId("board-trail").locator("[data-status]").evaluateAll((n) => n.map((e) => e.getAttribute("data-status")))) {
    expect(status).toBe("closed");
  }
});

test.describe("hazards", () => {
  test.use({ geolocation: { longitude: -121.9391, latitude: 47.3012 }, permissions: ["geolocation"] });

  test("a hazard with a photo, pinned from the phone's location, appears on the board with its count", async ({ page }) => {
    await signInAs(page, demo("ranger"), undefined, "/staff/harrow-ridge/hazards");
    await page.goto("/staff/harrow-ridge/hazards");
    await page.getByRole("radio", { name: "Washout" }).check();
    const mossback = await page.locator("#hazard-trail option", { hasText: "Mossback Ramble" }).getAttribute("value");
    await page.getByLabel("Trail (optional)").selectOption(mossback!);
    await page.getByRole("button", { name: "Use my location" }).click();
    await expect(page.getByLabel("Latitude")).toHaveValue("47.301200");
    await expect(page.getByLabel("Longitude")).toHaveValue("-121.939100");
    await page.getByLabel("Note").fill("Runoff cut a rut across the second bend");
    const photo = await sharp({ create: { width: 640, height: 480, channels: 3, background: "#6b5a3a" } }).png().toBuffer();
    await page.getByLabel(/^Photos/).setInputFiles({ name: "rut.png", mimeType: "image/png", buffer: photo });
    await shot(page, "hazard-form");
    await page.getByRole("button", { name: "Pin the hazard" }).click();
    await expect(page.getByTestId("hazard-result")).toHaveText("Hazard pinned. It is on the public board now.");

    await page.goto(BOARD);
    const card = boardCard(page, "Mossback Ramble");
    await expect(card.getByTestId("hazard-count")).toHaveText(/1 hazard\s*show/);
    await card.getByTestId("hazard-count").click();
    await expect(card.getByText("Runoff cut a rut across the second bend")).toBeVisible();
    const thumb = card.getByRole("img", { name: /Photo 1 of the washout/ });
    await expect(thumb).toBeVisible();
    await expect.poll(() => thumb.evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBe(320);
    await shot(page, "board-hazard");
  });

  test("a text file named .jpg is refused and nothing is pinned", async ({ page }) => {
    await signInAs(page, demo("ranger"), undefined, "/staff/harrow-ridge/hazards");
    await page.goto("/staff/harrow-ridge/hazards");
    const before = await page.getByRole("heading", { name: /Open hazards/ }).textContent();
    await page.getByLabel("Latitude").fill("47.3005");
    await page.getByLabel("Longitude").fill("-121.9405");
    await page.getByLabel(/^Photos/).setInputFiles({ name: "photo.jpg", mimeType: "image/jpeg", buffer: Buffer.from("not an image at all") });
    await page.getByRole("button", { name: "Pin the hazard" }).click();
    await expect(page.getByTestId("hazard-result")).toContainText("is not a JPEG, PNG or WebP image");
    await page.reload();
    await expect(page.getByRole("heading", { name: /Open hazards/ })).toHaveText(before!);
  });
});

test("history: a month at a glance and a sortable table, public", async ({ page, request }) => {
  const board = await (await request.get("/api/parks/harrow-ridge/board")).json();
  const gnarlroot = board.trails.find((t: { name: string }) => t.name === "Gnarlroot");
  await page.goto(`/trails/${gnarlroot.id}/history`);
  await expect(page.getByRole("heading", { name: "Gnarlroot: report history" })).toBeVisible();
  await expect(page.getByTestId("month-glance")).toBeVisible();
  await expect(page.getByTestId("history-table").locator("tbody tr").first()).toBeVisible();
  const dateHeader = page.getByRole("columnheader", { name: /Date/ });
  await expect(dateHeader).toHaveAttribute("aria-sort", "descending");
  await dateHeader.getByRole("button").click();
  await expect(dateHeader).toHaveAttribute("aria-sort", "ascending");
  await shot(page, "history");
});

test("the API: board public, writes need staff of the park, CSV for staff", async ({ page, request }) => {
  const board = await request.get("/api/parks/harrow-ridge/board");
  expect(board.status()).toBe(200);
  const body = await board.json();
  expect(body.date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  expect(body.trails[0]).toEqual(expect.objectContaining({ id: expect.any(String), name: expect.any(String), difficulty: expect.any(String), kind: expect.any(String), hazards: expect.any(Array), changedSinceYesterday: expect.any(Boolean) }));
  expect((await request.get("/api/parks/harrow-ridge/board", { headers: { "if-none-match": board.headers().etag } })).status()).toBe(304);

  const trailId = body.trails[0].id;
  expect((await request.post("/api/parks/harrow-ridge/morning-check", { data: { entries: [{ trailId, unchanged: true }] } })).status()).toBe(401);
  expect((await request.post(`/api/trails/${trailId}/reports`, { data: { status: "open" } })).status()).toBe(401);
  expect((await request.get("/api/parks/harrow-ridge/reports.csv")).status()).toBe(401);

  // The other park's ranger is refused here.
  await signInAs(page, "ranger@cinder.loamcast.test");
  const foreign = await page.request.post(`/api/trails/${trailId}/reports`, { data: { status: "open" } });
  expect(foreign.status()).toBe(403);
  const crossSite = await page.request.post(`/api/trails/${trailId}/reports`, { data: { status: "open" }, headers: { origin: "https://elsewhere.example" } });
  expect(crossSite.status()).toBe(403);

  await page.context().clearCookies();
  await signInAs(page, demo("manager"));
  const csv = await page.request.get("/api/parks/harrow-ridge/reports.csv");
  expect(csv.status()).toBe(200);
  expect(csv.headers()["content-type"]).toContain("text/csv");
  // A UTF-8 byte-order mark first, so spreadsheets show accents (issue #12 finding 7).
  expect([...(await csv.body()).subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
  expect((await csv.text()).replace(/^\uFEFF/, "").split("\r\n")[0]).toBe("date,trail,difficulty,status,reason,surfaces,berms,jumps,wood,note,reporter,inspected_at,revision");
  const bad = await page.request.post(`/api/trails/${trailId}/reports`, { data: { status: "closed", baseRevision: 0 } });
  expect(bad.status()).toBe(400);
  expect((await bad.json()).error).toEqual({ message: "Give a reason when a trail is closed.", field: "reason" });
});

test("a park-wide closure overrides every trail on the board until staff clear it", async ({ page }) => {
  await signInAs(page, demo("manager"), undefined, "/staff/harrow-ridge/morning-check");
  await page.goto("/staff/harrow-ridge/morning-check");
  const wholePark = page.getByRole("radio", { name: "Whole park closed" });
  // The panel opens by itself while a notice is in force; otherwise one tap opens it.
  if (!(await wholePark.isVisible())) await page.getByText("Park-wide notice").first().click();
  await wholePark.check();
  await page.getByLabel("Message").fill("Lightning on the ridge: lifts stopped");
  await page.getByRole("button", { name: "Set park-wide notice" }).click();
  await expect(page.getByText("Park-wide notice set. The board shows it now.")).toBeVisible();

  await page.goto(BOARD);
  await expect(page.getByTestId("park-state")).toContainText("Lightning on the ridge: lifts stopped");
  await expect(page.getByTestId("board-trail").locator('[data-status="closed"]')).toHaveCount(10);
  await expect(page.getByTestId("park-state")).toBeVisible();
  await shot(page, "board-park-closed");

  await page.goto("/staff/harrow-ridge/morning-check");
  await page.getByRole("button", { name: "Clear the park-wide notice" }).click();
  await expect(page.getByText("Cleared. Trails show their own status again.")).toBeVisible();
  await page.goto(BOARD);
  await expect(page.getByTestId("park-state")).toHaveCount(0);
});
