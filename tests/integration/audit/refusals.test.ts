import { afterAll, describe, expect, it, vi } from "vitest";
import { loadActor } from "@/lib/server/auth/actor";
import { AuditEvent, sequelize } from "@/models";
import { createPark, createUser } from "../helpers";

/** Refused authorisations are logged with who and what, never with the body (ASVS v5.0.0 16.3.2, 16.2.5). */
const session = vi.hoisted(() => ({ userId: null as string | null }));
vi.mock("@/lib/server/auth/actor", async (importOriginal) => {
  const actual = await importOriginal<typeof import("@/lib/server/auth/actor")>();
  return { ...actual, getActor: async () => (session.userId ? actual.loadActor(session.userId) : null) };
});
const { GET } = await import("@/app/api/parks/[parkSlug]/notices/route");

afterAll(() => sequelize.close());

describe("refused authorisations", () => {
  it("a rider reading a park's notices gets 403 and leaves an auth.refused entry naming them and the path", async () => {
    const park = await createPark();
    const rider = await createUser();
    session.userId = (await loadActor(rider.id))!.id;
    const response = await GET(new Request(`http://localhost/api/parks/${park.slug}/notices`), { params: Promise.resolve({ parkSlug: park.slug }) });
    expect(response.status).toBe(403);
    const entry = await AuditEvent.findOne({ where: { action: "auth.refused", actorId: rider.id } });
    expect(entry?.data).toMatchObject({ method: "GET", path: `/api/parks/${park.slug}/notices` });
  });
});
