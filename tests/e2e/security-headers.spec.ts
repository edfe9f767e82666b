import { expect, test } from "@playwright/test";
import { demo, signInAs } from "./helpers";

// ASVS v5.0.0 3.4.1–3.4.6 (headers) and 3.3.1–3.3.4 (cookies).
test("pages carry a nonce CSP and the protective headers", async ({ request }) => {
  const response = await request.get("/");
  const headers = response.headers();
  const csp = headers["content-security-policy"];
  expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
  expect(csp).toContain("frame-ancestors 'none'");
  expect(csp).toContain("object-src 'none'");
  expect(headers["x-content-type-options"]).toBe("nosniff");
  expect(headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
  // HSTS only when served over HTTPS (production); the test server is plain HTTP.
  expect(headers["strict-transport-security"]).toBeUndefined();
});

test("each response gets its own nonce and Next's scripts carry it", async ({ page, request }) => {
  const a = (await request.get("/")).headers()["content-security-policy"];
  const b = (await request.get("/")).headers()["content-security-policy"];
  expect(a).not.toEqual(b);
  const violations: string[] = [];
  page.on("console", (msg) => {
    if (/Content Security Policy/i.test(msg.text())) violations.push(msg.text());
  });
  await page.goto("/");
  await expect(page.getByRole("heading", { name: "Before you drive up" })).toBeVisible();
  expect(violations).toEqual([]);
});

test("the session cookie is HttpOnly and SameSite=Lax", async ({ page, context }) => {
  await signInAs(page, demo("rider"));
  const cookie = (await context.cookies()).find((c) => c.name.endsWith("next-auth.session-token"));
  expect(cookie).toBeDefined();
  expect(cookie!.httpOnly).toBe(true);
  expect(cookie!.sameSite).toBe("Lax");
});

test("a photo keeps its own sandboxing CSP; the proxy does not replace it (issue #12 finding 7, ASVS v5.0.0 3.2.1)", async ({ request }) => {
  const board = await (await request.get("/api/parks/harrow-ridge/board")).json();
  const photoId = board.trails.flatMap((t: { hazards: { photoIds: string[] }[] }) => t.hazards).find((h: { photoIds: string[] }) => h.photoIds.length > 0).photoIds[0];
  const photo = await request.get(`/api/photos/${photoId}?size=thumb`);
  expect(photo.status()).toBe(200);
  expect(photo.headers()["content-security-policy"]).toBe("default-src 'none'; sandbox");
  expect(photo.headers()["x-content-type-options"]).toBe("nosniff");
});
