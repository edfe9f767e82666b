import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { expect, test, type Page } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";

/**
 * The park's weather from the local fake Open-Meteo (its overnight-storm fixture answers Harrow
 * Ridge's coordinate) on every page that uses it. The app runs `next start` alone; the worker runs
 * once here (`tsx scripts/worker.ts --once`, same environment), as npm start's worker does every
 * 30 minutes. The storm fixture's today is 3 °C to 8 °C whatever the hour; its rain depends on the
 * hour of the run, so rain is checked as a figure in mm (the sums are worked by hand in
 * tests/unit/weather and tests/integration/weather).
 */
const run = promisify(execFile);
const ATTRIBUTION = "Weather data by Open-Meteo.com (CC BY 4.0)";

test.beforeAll(async () => {
  const worker = await run("node_modules/.bin/tsx", ["--conditions=react-server", "scripts/worker.ts", "--once"], { env: process.env, timeout: 60_000 });
  expect(worker.stdout).toMatch(/weather: \d+ of \d+ due parks updated, 0 failed/);
});

async function expectAttribution(page: Page, scope = page.locator("main")) {
  const link = scope.getByRole("link", { name: ATTRIBUTION }).first();
  await expect(link).toBeVisible();
  await expect(link).toHaveAttribute("href", "https://open-meteo.com/");
}

test("the ranger's morning check opens with last night's rain and the temperature now", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, "/staff/harrow-ridge/morning-check");
  await page.goto("/staff/harrow-ridge/morning-check");
  const weather = page.getByTestId("weather");
  await expect(weather).toContainText(/(Rain: \d+(\.\d)? mm|No rain) since yesterday 18:00/);
  // "Now" is the fixture's constant 3 °C; the night's low so far depends on the hour of the run (4 °C at midnight, 3 °C from 03:00).
  await expect(weather).toContainText(/3 °C now, overnight low \d+(\.\d)? °C/);
  await expect(weather).toContainText(/Last 24 h: \d+(\.\d)? mm \(the park's caution level is 10 mm\)/);
  await expect(weather).toContainText(/Measured \d\d:\d\d/);
  await expectAttribution(page);
  // The weather sits above the check, which stays the ranger's to fill.
  const weatherBox = await weather.boundingBox();
  const firstTrail = await page.getByRole("button", { name: /Unchanged|Change/ }).first().boundingBox();
  if (firstTrail) expect(weatherBox!.y).toBeLessThan(firstTrail.y);
  await shot(page, "weather-morning-check");
});

test("the board and a trail page show today's range and the rain in the last 24 h, with the time measured", async ({ page }) => {
  await page.goto("/parks/harrow-ridge");
  const weather = page.getByTestId("weather");
  await expect(weather).toContainText(/Today 3 °C to 8 °C · rain in the last 24 h: \d+(\.\d)? mm/);
  await expect(weather).toContainText(/Measured \d\d:\d\d/);
  await expectAttribution(page);
  await expect(page.getByTestId("board-summary")).toBeInViewport();
  await shot(page, "weather-board");

  const href = `/trails/${await page.getByTestId("board-trail").first().getAttribute("data-trail-id")}`;
  await page.goto(href);
  await expect(page.getByTestId("weather")).toContainText(/Today 3 °C to 8 °C · rain in the last 24 h: \d+(\.\d)? mm/);
  await expectAttribution(page);
  await shot(page, "weather-trail-page");

  // History: each day's rain beside its reports (yesterday's storm, up to the hour ending at midnight, is 11 mm).
  await page.goto(`${href}/history`);
  const table = page.getByTestId("history-table");
  await expect(table.getByRole("columnheader", { name: /Rain that day/ })).toBeVisible();
  await expect(table.locator("tbody td").filter({ hasText: /^\d+(\.\d)? mm$/ }).first()).toBeVisible();
  await expectAttribution(page);
  await shot(page, "weather-history");
});

test("with no temperature typed, the pressure band uses the forecast on the trail and now's at the pump", async ({ page }) => {
  await page.goto("/pressure?park=harrow-ridge");
  await expect(page.getByTestId("pressure-weather")).toContainText("8 °C forecast for 10:00–14:00, 3 °C now");
  await expectAttribution(page);
  await page.getByLabel("Rider with kit (kg)").fill("72");
  await page.getByLabel("Bike (kg)").fill("15.5");
  await page.getByRole("button", { name: "Next: Wheels and tyres" }).click();
  await page.getByLabel("Front wheel: tyre's printed maximum (psi)").fill("40");
  await page.getByLabel("Rear wheel: tyre's printed maximum (psi)").fill("40");
  await page.getByRole("button", { name: "Next: Pressures that have worked" }).click();
  await page.getByRole("button", { name: "Show my pressure band" }).click();
  const row = page.getByTestId("reasons").locator("tr[data-reason=pump-temperature]");
  await expect(row).toContainText("Trail 5 °C warmer than where you pump (the park's weather: 8 °C forecast for 10:00–14:00, 3 °C now)");
  // Pumped at 3 °C for an 8 °C trail: a lower reading now (Gay-Lussac; worked by hand in tests/integration/weather/pressure-forecast.test.ts).
  await expect(row).toContainText(/−\d+\.\d psi/);
  await shot(page, "weather-pressure");

  // The rider rides in the afternoon: the forecast for 14:00–16:00 is (8 + 7.5 + 7) / 3 = 7.5 °C (the fixture's hours).
  await page.getByText("More about today (optional)").click();
  await page.getByLabel("From").selectOption("14");
  await page.getByLabel("Until").selectOption("16");
  await page.getByRole("button", { name: "Show my pressure band" }).click();
  await expect(row).toContainText("Trail 4.5 °C warmer than where you pump (the park's weather: 7.5 °C forecast for 14:00–16:00, 3 °C now)");
});

test("a manager sets the park's rain caution level; the morning check uses it, and a bad value is refused beside the field", async ({ page }) => {
  await signInAs(page, demo("manager"), undefined, "/staff/harrow-ridge/settings");
  await page.goto("/staff/harrow-ridge/settings");
  const field = page.getByLabel("Rain caution level (mm in 24 h)");
  await expect(field).toHaveValue("10");
  await field.fill("lots");
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.locator("form").getByText("Enter the rain caution level in millimetres.").first()).toBeVisible();
  await field.fill("60");
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByText("Settings saved.")).toBeVisible();
  await shot(page, "weather-settings");
  await page.goto("/staff/harrow-ridge/morning-check");
  const weather = page.getByTestId("weather");
  await expect(weather).toContainText("(the park's caution level is 60 mm)");
  // The storm's rain (at most 14 mm) is below 60 mm: no caution.
  await expect(weather.getByRole("note")).toHaveCount(0);
  // Back to the default, for the journeys after this one.
  await page.goto("/staff/harrow-ridge/settings");
  await page.getByLabel("Rain caution level (mm in 24 h)").fill("10");
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByText("Settings saved.")).toBeVisible();
});
