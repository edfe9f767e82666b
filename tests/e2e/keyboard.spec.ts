import { expect, test, type Page } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";

/**
 * Keyboard only: after signing in, nothing below uses the mouse or fills fields directly; only
 * Tab, Shift+Tab, Space, Enter, the arrow keys and typed text. The pressure page's basic keyboard
 * journey (a setup typed by hand) is in pressure.spec.ts; this adds saved setups, the unit switch
 * and the optional "More about today" panel.
 */
type Focused = { label: string; trail: string | null; type: string; checked: boolean; unobscured: boolean };

/** What has focus: its label, the checked trail it belongs to, and whether it can be seen (not under the sticky Save bar). */
const focused = (page: Page): Promise<Focused> =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLInputElement;
    const label = (el.labels?.[0]?.textContent ?? el.getAttribute("aria-label") ?? el.textContent ?? "").trim();
    // Toggle inputs are visually hidden inside their label: the label is what must be seen.
    const box = el.getBoundingClientRect().width <= 1 && el.labels?.[0] ? el.labels[0] : el;
    const r = box.getBoundingClientRect();
    const hit = document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2);
    return {
      label,
      trail: el.closest("[data-trail-name]")?.getAttribute("data-trail-name") ?? null,
      type: el.getAttribute("type") ?? el.tagName.toLowerCase(),
      checked: Boolean(el.checked),
      unobscured: Boolean(hit && (box.contains(hit) || hit.contains(box))),
    };
  });

/** Presses `key` until the focused control matches; every control passed on the way must be visible. */
async function pressUntil(page: Page, key: "Tab" | "Shift+Tab", matches: (f: Focused) => boolean, max = 400): Promise<Focused> {
  for (let presses = 1; presses <= max; presses++) {
    await page.keyboard.press(key);
    const now = await focused(page);
    expect(now.unobscured, `focus on "${now.label}" (${now.trail ?? "page"}) is hidden behind something`).toBe(true);
    if (matches(now)) return now;
  }
  throw new Error(`${key} never reached the control`);
}

test("the morning check with the keyboard alone: a status, a reason, a surface, Unchanged, save", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, "/staff/harrow-ridge/morning-check");
  await expect(page.getByRole("heading", { name: "Morning check" })).toBeVisible();
  const card = (name: string) => page.locator(`[data-testid="check-trail"][data-trail-name="${name}"]`);

  // Cedar Skip's Change opens its controls with Enter; Tab lands on the status shown (or the first), arrows move and select.
  await pressUntil(page, "Tab", (f) => f.trail === "Cedar Skip" && f.label === "Change");
  await page.keyboard.press("Enter");
  const status = await pressUntil(page, "Tab", (f) => f.trail === "Cedar Skip" && f.type === "radio");
  expect(["Open", "Caution", "Closed"].some((s) => status.label.includes(s))).toBe(true);
  for (let i = 0; i < 3 && !(await focused(page)).label.includes("Caution"); i++) await page.keyboard.press("ArrowRight");
  await expect(card("Cedar Skip").getByRole("radio", { name: "Caution" })).toBeChecked();
  await expect(card("Cedar Skip").getByTestId("mode")).toHaveText("Changed");

  // The reason field follows the status; then a surface, ticked with Space.
  await pressUntil(page, "Tab", (f) => f.label === "Reason (caution)");
  await page.keyboard.type("Fresh gravel on the lower switchbacks");
  const wet = card("Cedar Skip").getByRole("checkbox", { name: "wet", exact: true });
  const wasWet = await wet.isChecked();
  await pressUntil(page, "Tab", (f) => f.trail === "Cedar Skip" && f.label === "wet");
  await page.keyboard.press("Space");
  await expect(wet).toBeChecked({ checked: !wasWet });
  // Back with Shift+Tab to the reason: what was typed is still there.
  await pressUntil(page, "Shift+Tab", (f) => f.label === "Reason (caution)");
  await expect(card("Cedar Skip").getByLabel("Reason (caution)")).toHaveValue("Fresh gravel on the lower switchbacks");

  // Another trail kept as it was: Unchanged with Enter.
  await pressUntil(page, "Tab", (f) => f.trail === "Gnarlroot" && f.label.startsWith("Unchanged"));
  await page.keyboard.press("Enter");
  await expect(card("Gnarlroot").getByTestId("mode")).toHaveText("Unchanged");
  await shot(page, "keyboard-check");

  // On to the Save button, past every other trail; Enter saves.
  await pressUntil(page, "Tab", (f) => /^Save \d+ trails?$/.test(f.label));
  await expect(page.getByRole("button", { name: "Save 2 trails" })).toBeFocused();
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("check-outcome")).toContainText("Saved 2 trails.");

  await page.goto("/parks/harrow-ridge");
  const boardCard = page.getByTestId("board-trail").filter({ has: page.getByRole("heading", { name: "Cedar Skip", exact: true }) });
  await expect(boardCard.locator('[data-status="caution"]')).toBeVisible();
  await expect(boardCard).toContainText("Fresh gravel on the lower switchbacks");
});

test("the pressure page with the keyboard alone: a saved setup, the unit switch and the optional panel", async ({ page }) => {
  await signInAs(page, demo("rider"), undefined, "/pressure");
  await expect(page.getByRole("heading", { name: "Today's pressure" })).toBeVisible();
  await expect(page.getByRole("radio", { name: /Hardpack 29er/ })).toBeChecked();

  // "More about today" opens with Enter; temperatures are typed into it.
  await pressUntil(page, "Tab", (f) => f.label.startsWith("More about today"));
  await page.keyboard.press("Enter");
  await pressUntil(page, "Tab", (f) => f.label === "Air on the trail (°C)");
  await page.keyboard.type("4");
  await page.keyboard.press("Tab");
  expect((await focused(page)).label).toBe("Where you pump (°C)");
  await page.keyboard.type("20");

  // The saved setups are one radio group: the arrow key picks the other bike.
  await pressUntil(page, "Tab", (f) => f.label.includes("Hardpack 29er"));
  await page.keyboard.press("ArrowDown");
  await expect(page.getByRole("radio", { name: /Mixed-wheel park bike/ })).toBeChecked();

  // The unit switch: Tab into it, arrow to bar.
  await pressUntil(page, "Tab", (f) => f.label === "psi");
  await page.keyboard.press("ArrowRight");
  await expect(page.getByRole("group", { name: "Show pressures in" }).getByRole("radio", { name: "bar" })).toBeChecked();

  await pressUntil(page, "Tab", (f) => f.label === "Show my pressure band");
  await page.keyboard.press("Enter");
  await expect(page.getByRole("heading", { name: "Today's band" })).toBeFocused();
  await expect(page.getByTestId("band-front")).toContainText(/\d\.\d\d bar/);
  await expect(page.getByTestId("band-result")).toContainText("A starting estimate");
  await expect(page.getByTestId("reasons").locator("tr[data-reason=pump-temperature]")).toContainText("colder than where you pump");
  await expect(page.getByTestId("cautions")).toContainText("Never go above the tyre's or the rim's printed maximum pressure");
  await shot(page, "keyboard-pressure");
});
