import path from "node:path";
import { expect, test, type Page } from "@playwright/test";
import { demo, signInAs, shot } from "./helpers";

const GOOD_GPX = path.resolve("data/demo-park/trails/gnarlroot.gpx");
const CORPUS = (file: string) => path.resolve("tests/fixtures/trails", file);
const STAT_NAMES = ["lengthM", "ascentM", "descentM", "avgGradePct", "maxGradePct", "minElevationM", "maxElevationM", "suggestedDifficulty"];

async function openUploadPage(page: Page) {
  await signInAs(page, demo("manager"), undefined, "/staff/harrow-ridge/trails/new");
  await expect(page.getByRole("heading", { name: "Upload a trail" })).toBeVisible();
}

test("a manager uploads a GPX, checks the preview, saves it and finds it in the list and on its page", async ({ page }) => {
  await openUploadPage(page);
  await page.getByTestId("trail-file").setInputFiles(GOOD_GPX);
  const preview = page.getByTestId("upload-preview");
  await expect(preview).toBeVisible();
  await expect(preview.getByTestId("figure-length")).toContainText(/\d(\.\d+)? km/);
  await expect(preview.getByTestId("figure-descent")).toContainText(/\d+ m/);
  await expect(preview.getByTestId("figure-suggested")).toContainText(/Easiest|Easy|More difficult|Very difficult|Extremely difficult/);
  await expect(preview.getByTestId("elevation-profile")).toBeVisible();
  // Nothing is stored by the preview: the name the file carries is offered, the trail is not listed yet.
  const name = `Gnarlroot Reroute ${Date.now().toString(36)}`;
  await shot(page, "trail-upload-preview");
  await page.getByLabel("Trail name").fill(name);
  await page.getByLabel("Kind").selectOption("technical");
  await page.getByRole("button", { name: "Save trail" }).click();

  await expect(page).toHaveURL(/\/trails\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("heading", { level: 1, name })).toBeVisible();
  await expect(page.getByTestId("elevation-profile")).toBeVisible();
  await expect(page.getByTestId("figure-descent")).toContainText(/\d+ m/);
  await expect(page.getByText("Version 1")).toBeVisible();
  await shot(page, "trail-page");

  await page.goto("/parks/harrow-ridge/trails?sort=length&dir=desc");
  const table = page.getByTestId("trail-table");
  await expect(table.getByRole("link", { name })).toBeVisible();
  await expect(table.getByRole("columnheader", { name: /Length/ })).toHaveAttribute("aria-sort", "descending");
  await shot(page, "trail-list");
});

test("a bad file gets the server's clear refusal and nothing is saved", async ({ page, request }) => {
  const before = (await (await request.get("/api/parks/harrow-ridge/trails")).json()).trails.length;
  await openUploadPage(page);
  await page.getByTestId("trail-file").setInputFiles(CORPUS("billion-laughs.gpx"));
  await expect(page.getByTestId("upload-refused")).toContainText("DOCTYPE or ENTITY declaration");
  await expect(page.getByTestId("upload-preview")).toHaveCount(0);
  await shot(page, "trail-upload-refused");
  await page.getByTestId("trail-file").setInputFiles(CORPUS("track.kml"));
  await expect(page.getByTestId("upload-refused")).toContainText("This is a KML file");
  await page.getByTestId("trail-file").setInputFiles(CORPUS("swapped-out-of-range.geojson"));
  await expect(page.getByTestId("upload-refused")).toContainText("look swapped");
  expect((await (await request.get("/api/parks/harrow-ridge/trails")).json()).trails.length).toBe(before);
});

test("the public API lists trails with their figures and a trail with profile, features and versions", async ({ request }) => {
  const list = await (await request.get("/api/parks/harrow-ridge/trails")).json();
  expect(list.trails.length).toBeGreaterThanOrEqual(10);
  const plumbline = list.trails.find((t: { name: string }) => t.name === "Plumbline");
  for (const key of ["id", "name", "difficulty", "kind", "direction", ...STAT_NAMES]) expect(plumbline).toHaveProperty(key);
  expect(plumbline.lengthM).toBeGreaterThan(0);

  const detail = await request.get(`/api/trails/${plumbline.id}`);
  expect(detail.status()).toBe(200);
  const { trail } = await detail.json();
  expect(trail.profile.length).toBeGreaterThan(2);
  expect(trail.versions[0]).toMatchObject({ versionNo: 1 });
  expect(trail.versions[0]).not.toHaveProperty("sourceBytes");
  expect(Array.isArray(trail.features)).toBe(true);
  expect((await request.get("/api/trails/not-a-trail")).status()).toBe(404);
});

test("downloads come as attachments with a safe name and the right type", async ({ request }) => {
  const { trails } = await (await request.get("/api/parks/harrow-ridge/trails")).json();
  const gnarlroot = trails.find((t: { name: string }) => t.name === "Gnarlroot");
  const gpx = await request.get(`/api/trails/${gnarlroot.id}/download?format=gpx`);
  expect(gpx.status()).toBe(200);
  expect(gpx.headers()["content-type"]).toBe("application/gpx+xml");
  expect(gpx.headers()["content-disposition"]).toBe('attachment; filename="gnarlroot-v1.gpx"');
  expect(await gpx.text()).toContain("<gpx");
  const geojson = await request.get(`/api/trails/${gnarlroot.id}/download?format=geojson`);
  expect(geojson.headers()["content-type"]).toBe("application/geo+json");
  expect(geojson.headers()["content-disposition"]).toBe('attachment; filename="gnarlroot-v1.geojson"');
  expect((await geojson.json()).type).toBe("FeatureCollection");
  expect((await request.get(`/api/trails/${gnarlroot.id}/download?format=kml`)).status()).toBe(400);
});

test("uploads and edits are refused to anonymous visitors (401) and riders (403)", async ({ page, request }) => {
  const multipart = { file: { name: "line.gpx", mimeType: "application/gpx+xml", buffer: Buffer.from("<gpx/>") } };
  expect((await request.post("/api/parks/harrow-ridge/trails", { multipart })).status()).toBe(401);
  const { trails } = await (await request.get("/api/parks/harrow-ridge/trails")).json();
  expect((await request.patch(`/api/trails/${trails[0].id}`, { data: { name: "x", lockVersion: 0 } })).status()).toBe(401);
  await signInAs(page, demo("rider"));
  expect((await page.request.post("/api/parks/harrow-ridge/trails/preview", { multipart })).status()).toBe(403);
  expect((await page.request.delete(`/api/trails/${trails[0].id}`)).status()).toBe(403);
});

test("a ranger edits a trail: details with a stale-version clash, and a feature added by distance", async ({ page }) => {
  await signInAs(page, demo("ranger"));
  const { trails } = await (await page.request.get("/api/parks/harrow-ridge/trails")).json();
  const cedar = trails.find((t: { name: string }) => t.name === "Cedar Skip");
  await page.goto(`/staff/harrow-ridge/trails/${cedar.id}/edit`);
  await expect(page.getByRole("heading", { name: "Edit Cedar Skip" })).toBeVisible();

  // Someone else saves first (same trail, through the API): our form still holds the old lockVersion.
  const { trail } = await (await page.request.get(`/api/trails/${cedar.id}`)).json();
  const theirDirection = trail.direction === "both" ? "uphill" : "both";
  const other = await page.request.patch(`/api/trails/${cedar.id}`, { data: { direction: theirDirection, lockVersion: trail.lockVersion } });
  expect(other.status()).toBe(200);
  await page.getByLabel("Kind").first().selectOption(trail.kind === "jump" ? "flow" : "jump");
  await page.getByRole("button", { name: "Save details" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "Someone else changed this trail" })).toBeVisible();
  await expect(page.getByLabel("Direction")).toHaveValue(theirDirection);
  await page.getByLabel("Kind").first().selectOption("jump");
  await page.getByRole("button", { name: "Save details" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Saved." })).toBeVisible();

  const form = page.locator("form").filter({ has: page.getByRole("heading", { name: "Add a feature" }) });
  await form.getByLabel("Feature").selectOption("drop");
  await form.getByLabel("Size").selectOption("large");
  await form.getByLabel(/From start/).fill("120");
  await form.getByLabel("Name (optional)").fill("Stump drop");
  await form.getByRole("button", { name: "Add feature" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Feature added." })).toBeVisible();
  await shot(page, "trail-edit");
  const after = await (await page.request.get(`/api/trails/${cedar.id}`)).json();
  expect(after.trail).toMatchObject({ kind: "jump", direction: theirDirection });
  expect(after.trail.features).toEqual(expect.arrayContaining([expect.objectContaining({ kind: "drop", size: "large", name: "Stump drop", distanceAlongM: 120 })]));
});
