import { expect, test } from "@playwright/test";

test("health reports the database", async ({ request }) => {
  const response = await request.get("/api/health");
  expect(response.status()).toBe(200);
  expect(await response.json()).toEqual({ status: "ok", db: "up" });
});

test("parks are listed publicly and unknown parks are 404 in the error shape", async ({ request }) => {
  const list = await (await request.get("/api/parks")).json();
  expect(list.parks.map((p: { slug: string }) => p.slug)).toContain("harrow-ridge");
  const park = await (await request.get("/api/parks/harrow-ridge")).json();
  expect(park.park).toMatchObject({ slug: "harrow-ridge", timeZone: "America/Los_Angeles", baseElevationM: 620, summitElevationM: 1340 });
  const missing = await request.get("/api/parks/no-such-park");
  expect(missing.status()).toBe(404);
  expect(await missing.json()).toEqual({ error: { message: "Park not found." } });
});

test("captured mail is for admins only", async ({ request }) => {
  expect((await request.get("/api/dev/mail")).status()).toBe(401);
});
