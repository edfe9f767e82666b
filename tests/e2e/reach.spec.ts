import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { expect, test, type Page } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";

/** Riders reached outside the app's own pages: offline copies, the embed, print, calendar, feed, previews. */
const PARK = "harrow-ridge";

/** Waits until the service worker controls the page and holds a copy of `path` in `cacheName`. */
async function cachedByServiceWorker(page: Page, cacheName: string, path: string) {
  await page.evaluate(() => navigator.serviceWorker.ready);
  await expect.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller)), { timeout: 20_000 }).toBe(true);
  await expect
    .poll(() => page.evaluate(async ([name, p]) => (await (await caches.open(name)).keys()).some((r) => new URL(r.url).pathname === p), [cacheName, path] as const), { timeout: 20_000 })
    .toBe(true);
}

test.describe("offline", () => {
  test("the last board and map stay readable offline, with the time they are from", async ({ page, context }) => {
    await page.goto(`/parks/${PARK}`);
    const trails = page.getByTestId("board-trail");
    const count = await trails.count();
    expect(count).toBeGreaterThan(0);
    await cachedByServiceWorker(page, "park-pages", `/parks/${PARK}`);

    await context.setOffline(true);
    await page.reload();
    await expect(page.getByTestId("offline-note")).toContainText(/^As of \d\d:\d\d, you are offline/);
    await expect(trails).toHaveCount(count);
    await shot(page, "offline-board");

    // Back online, the page refreshes itself to the current board.
    const refreshed = page.waitForEvent("framenavigated");
    await context.setOffline(false);
    await refreshed;
    await expect(page.getByTestId("offline-note")).toHaveCount(0);
    await page.goto(`/parks/${PARK}/map`);
    await expect(page.locator("canvas.maplibregl-canvas")).toBeVisible({ timeout: 30_000 });
    await cachedByServiceWorker(page, "park-pages", `/parks/${PARK}/map`);
    await cachedByServiceWorker(page, "park-data", `/api/parks/${PARK}/trails.geojson`);
    await context.setOffline(true);
    await page.reload();
    await expect(page.getByTestId("offline-note")).toBeVisible();
    await expect(page.getByRole("heading", { level: 1 })).toContainText("map");
    await expect(page.locator("canvas.maplibregl-canvas")).toBeVisible({ timeout: 30_000 });
    await expect(page.locator("#trail-list")).toBeVisible();
    await shot(page, "offline-map");
    await context.setOffline(false);
  });

  test("a staff form offline says it was not sent, and nothing changes", async ({ page, context }) => {
    await signInAs(page, demo("manager"), undefined, `/staff/${PARK}`);
    await page.goto(`/staff/${PARK}`);
    const origins = page.getByLabel("Websites allowed to show the card");
    const before = await origins.inputValue();
    await context.setOffline(true);
    await origins.fill("https://offline-attempt.example");
    await page.getByRole("button", { name: "Save websites" }).click();
    await expect(page.getByTestId("offline-not-sent")).toContainText("Offline, not sent");
    await context.setOffline(false);
    await page.reload();
    await expect(page.getByLabel("Websites allowed to show the card")).toHaveValue(before);
  });
});

test.describe("on the park's own website", () => {
  // The park's website: a page on another origin of this machine, served by the test, that frames
  // the card. (A page Playwright fulfils counts as public, and Chromium keeps public pages away
  // from loopback addresses, so it is a real loopback server.)
  let website: Server;
  let websiteOrigin = "";
  test.beforeAll(async ({ baseURL }) => {
    website = createServer((_req, res) => {
      res.writeHead(200, { "content-type": "text/html" });
      res.end(`<!doctype html><h1>Resort</h1><iframe id="card" src="${baseURL}/embed/parks/${PARK}" width="360" height="480"></iframe>`);
    });
    await new Promise<void>((resolve) => website.listen(0, "127.0.0.1", resolve));
    websiteOrigin = `http://127.0.0.1:${(website.address() as AddressInfo).port}`;
  });
  test.afterAll(() => new Promise<void>((resolve) => website.close(() => resolve())));
  const openParkWebsite = (page: Page) => page.goto(`${websiteOrigin}/conditions`);

  const cardHeading = (page: Page) => page.frameLocator("#card").getByRole("heading", { level: 1 });

  test("the status card shows only on the websites the park lists", async ({ page, baseURL, browser }) => {
    const staff = await browser.newPage();
    await signInAs(staff, demo("manager"), undefined, `/staff/${PARK}`);
    await staff.goto(`/staff/${PARK}`);
    await expect(staff.getByLabel("Status card snippet")).toHaveValue(new RegExp(`<iframe src="${baseURL}/embed/parks/${PARK}"`));
    const save = async (value: string) => {
      await staff.getByLabel("Websites allowed to show the card").fill(value);
      await staff.getByRole("button", { name: "Save websites" }).click();
      await expect(staff.getByRole("status").filter({ hasText: "Saved" })).toBeVisible();
    };

    await save("https://someone-else.example");
    await openParkWebsite(page);
    await expect(cardHeading(page)).toHaveCount(0); // framing refused by frame-ancestors

    await save("not a website");
    await expect(staff.locator("#embed-origins-error")).toContainText("not a website origin");

    await save(websiteOrigin);
    await page.reload();
    await expect(cardHeading(page)).toHaveText("Harrow Ridge Bike Park");
    await expect(page.frameLocator("#card").locator("li").first()).toBeVisible();
    await shot(page, "embedded-card");

    const card = await page.request.get(`/embed/parks/${PARK}`);
    expect(card.headers()["content-security-policy"]).toContain(`frame-ancestors 'self' ${websiteOrigin}`);
    expect(card.headers()["x-frame-options"]).toBeUndefined();
    expect(card.headers()["set-cookie"]).toBeUndefined();
    const board = await page.request.get(`/parks/${PARK}`);
    expect(board.headers()["content-security-policy"]).toContain("frame-ancestors 'none'");

    await save("");
    await staff.close();
  });

  test("the park's website reads status.json across origins and revalidates with its ETag", async ({ page, baseURL }) => {
    await openParkWebsite(page);
    const result = await page.evaluate(async (url) => {
      const first = await fetch(url);
      const body = await first.json();
      const etag = first.headers.get("etag");
      const again = await fetch(url, { headers: { "If-None-Match": etag ?? "" }, cache: "no-store" });
      return { status: first.status, trails: body.trails.length, name: body.park.name, etag, again: again.status };
    }, `${baseURL}/api/parks/${PARK}/status.json`);
    expect(result).toMatchObject({ status: 200, name: "Harrow Ridge Bike Park", again: 304 });
    expect(result.trails).toBeGreaterThan(0);
    expect(result.etag).toBeTruthy();
  });
});

test.describe("print, calendar and link previews", () => {
  test("the daily sheet lists every trail and prints without the site's header", async ({ page, request }) => {
    const feed = await (await request.get(`/api/parks/${PARK}/status.json`)).json();
    await page.goto(`/parks/${PARK}/print`);
    await expect(page.getByTestId("print-trail")).toHaveCount(feed.trails.length);
    await expect(page.getByText(/^Printed .* park time/)).toBeVisible();
    await page.emulateMedia({ media: "print" });
    await expect(page.getByRole("banner").first()).toBeHidden();
    await shot(page, "print-sheet");
    await page.goto(`/parks/${PARK}/print/labels`);
    await expect(page.getByTestId("qr-label")).toHaveCount(feed.trails.length);
    await expect(page.getByRole("img", { name: new RegExp(`QR code for ${feed.trails[0].name}: .*/trails/${feed.trails[0].id}$`) })).toBeVisible();
    await shot(page, "qr-labels");
  });

  test("the board offers the calendar, which is served as text/calendar", async ({ page, request }) => {
    await page.goto(`/parks/${PARK}`);
    const link = page.getByRole("link", { name: "Subscribe in your calendar" });
    await expect(link).toHaveAttribute("href", new RegExp(`^webcal://[^/]+/api/parks/${PARK}/closures\\.ics$`));
    const ics = await request.get(`/api/parks/${PARK}/closures.ics`);
    expect(ics.headers()["content-type"]).toBe("text/calendar; charset=utf-8");
    expect(await ics.text()).toMatch(/^BEGIN:VCALENDAR\r\nVERSION:2\.0\r\n/);
  });

  test("board and trail pages carry Open Graph and Twitter card tags with a drawn image", async ({ page, request }) => {
    await page.goto(`/parks/${PARK}`);
    const image = await page.locator('meta[property="og:image"]').getAttribute("content");
    expect(image).toMatch(new RegExp(`/api/parks/${PARK}/preview\\.png$`));
    await expect(page.locator('meta[name="twitter:card"]')).toHaveAttribute("content", "summary_large_image");
    const png = await request.get(new URL(image!).pathname);
    expect(png.headers()["content-type"]).toBe("image/png");
    const bytes = await png.body();
    // PNG signature, then the IHDR chunk's width and height (ISO/IEC 15948 §11.2.2).
    expect(bytes.subarray(1, 4).toString()).toBe("PNG");
    expect([bytes.readUInt32BE(16), bytes.readUInt32BE(20)]).toEqual([1200, 630]);

    const trailId = (await (await request.get(`/api/parks/${PARK}/status.json`)).json()).trails[0].id;
    await page.goto(`/trails/${trailId}`);
    await expect(page.locator('meta[property="og:image"]')).toHaveAttribute("content", new RegExp(`preview\\.png\\?trail=${trailId}$`));
    expect((await request.get(`/api/parks/${PARK}/preview.png?trail=${trailId}`)).status()).toBe(200);
    expect((await request.get(`/api/parks/${PARK}/preview.png?trail=not-a-trail`)).status()).toBe(400);
  });
});
