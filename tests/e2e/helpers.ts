import { expect, type Page } from "@playwright/test";

export const DEMO_PASSWORD = "ridgeline-demo-7";
export const demo = (who: "admin" | "manager" | "ranger" | "rider" | "rider2") => `${who}@demo.loamcast.test`;

export async function signInAs(page: Page, email: string, password = DEMO_PASSWORD, callbackUrl = "/") {
  await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("signed-in-as")).toBeVisible();
}

export async function shot(page: Page, name: string) {
  await page.screenshot({ path: `.local/test-results/screens/${name}-${page.viewportSize()?.width}.png`, fullPage: true });
}
