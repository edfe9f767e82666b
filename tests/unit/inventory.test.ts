import { describe, expect, it } from "vitest";
import { exportedMethods, routeHandlers, routeOf, serverActions } from "../inventory";

describe("reading routes and server actions from the source (the authorization matrix's inventory)", () => {
  it("finds methods exported as constants, functions and re-exports", () => {
    expect(exportedMethods("export const GET = handler(async () => x);\nexport const PATCH = handler<{ id: string }>(f);")).toEqual(["GET", "PATCH"]);
    expect(exportedMethods("export async function POST(request: Request) {}\nexport function DELETE() {}")).toEqual(["POST", "DELETE"]);
    expect(exportedMethods("const auth = NextAuth(o);\nexport { auth as GET, auth as POST };")).toEqual(["GET", "POST"]);
    expect(exportedMethods("export const dynamic = 'force-dynamic';\nexport const GETTER = 1;")).toEqual([]);
  });

  it("turns a route file into its path, without route groups", () => {
    expect(routeOf("app/api/trails/[id]/reports/route.ts")).toBe("/api/trails/[id]/reports");
    expect(routeOf("app/(admin)/api/x/route.ts")).toBe("/api/x");
  });

  it("finds every route handler and server action of this app", () => {
    const routes = routeHandlers().map((r) => `${r.method} ${r.route}`);
    expect(routes).toContain("POST /api/parks/[parkSlug]/morning-check");
    expect(routes).toContain("POST /api/auth/[...nextauth]");
    expect(routes).toContain("GET /embed/parks/[parkSlug]");
    expect(serverActions().map((a) => a.name)).toContain("setParkStateAction");
  });
});
