import { expect, test } from "@playwright/test";
import { demo, signInAs, shot } from "./helpers";

const navFor: Record<string, string[]> = {
  admin: ["Parks", "Tyre pressure", "My bike", "Staff desk", "All parks", "Sent mail"],
  manager: ["Parks", "Tyre pressure", "My bike", "Staff desk"],
  ranger: ["Parks", "Tyre pressure", "My bike", "Staff desk"],
  rider: ["Parks", "Tyre pressure", "My bike"],
};

for (const [role, links] of Object.entries(navFor)) {
  test(`${role} signs in and sees the ${role} navigation`, async ({ page }) => {
    await signInAs(page, demo(role as "admin"));
    const nav = page.getByRole("navigation", { name: "Main" });
    await expect(nav).toHaveAttribute("data-role", role);
    for (const label of links) await expect(nav.getByRole("link", { name: label, exact: true })).toBeVisible();
    const all = await nav.getByRole("link").allTextContents();
    expect(all.map((t) => t.trim())).toEqual(links);
    await shot(page, `nav-${role}`);
  });
}

test("a rider is refused the staff desk", async ({ page }) => {
  await signInAs(page, demo("rider"));
  await page.goto("/staff");
  await expect(page.getByTestId("refused")).toContainText("Staff only");
});

test("anonymous visitors are sent to sign in", async ({ page }) => {
  await page.goto("/staff");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fstaff/);
  await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();
});

test("a wrong password gets a clear message", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demo("rider"));
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.locator("form [role=alert]")).toContainText("do not match");
});

test("a new rider signs up; a short password is refused first", async ({ page }) => {
  const email = `newrider-${Date.now()}@tests.loamcast.test`;
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Lee Newrider");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("short");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.locator("#field-password-error")).toContainText("at least 8");
  // Nothing typed is lost: name and e-mail are still filled in.
  await expect(page.getByLabel("E-mail")).toHaveValue(email);
  await expect(page.getByLabel("Your name")).toHaveValue("Lee Newrider");
  await page.getByLabel("Password").fill("valley-fog-mornings-3");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page).toHaveURL(/sign-in\?created=1/);
  await signInAs(page, email, "valley-fog-mornings-3");
  await expect(page.getByTestId("signed-in-as")).toContainText("rider");
});
