import { describe, expect, it } from "vitest";
import { ACTIONS, authorize, can, primaryRole, type Action, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";

// Every role × every action the permission module knows (ASVS v5.0.0 8.2.1, 8.2.2).
const PARK = "park-a";
const OTHER_PARK = "park-b";
const base = { email: "x@example.test", name: "X" };
const actors: Record<string, Actor | null> = {
  anonymous: null,
  rider: { id: "rider", ...base, siteRole: "rider", memberships: [] },
  ranger: { id: "ranger", ...base, siteRole: "rider", memberships: [{ parkId: PARK, role: "ranger" }] },
  manager: { id: "manager", ...base, siteRole: "rider", memberships: [{ parkId: PARK, role: "manager" }] },
  otherRanger: { id: "other", ...base, siteRole: "rider", memberships: [{ parkId: OTHER_PARK, role: "ranger" }] },
  admin: { id: "admin", ...base, siteRole: "admin", memberships: [] },
};

// Expected answer for a park-scoped action on PARK, per caller.
const expected: Record<Action, Record<string, boolean>> = {
  "park:create": { anonymous: false, rider: false, ranger: false, manager: false, otherRanger: false, admin: true },
  "park:update": { anonymous: false, rider: false, ranger: false, manager: true, otherRanger: false, admin: true },
  "staff:invite": { anonymous: false, rider: false, ranger: false, manager: true, otherRanger: false, admin: true },
  "team:read": { anonymous: false, rider: false, ranger: true, manager: true, otherRanger: false, admin: true },
  "team:manage": { anonymous: false, rider: false, ranger: false, manager: true, otherRanger: false, admin: true },
  "trail:write": { anonymous: false, rider: false, ranger: true, manager: true, otherRanger: false, admin: true },
  "report:write": { anonymous: false, rider: false, ranger: true, manager: true, otherRanger: false, admin: true },
  "hazard:write": { anonymous: false, rider: false, ranger: true, manager: true, otherRanger: false, admin: true },
  "notice:send": { anonymous: false, rider: false, ranger: true, manager: true, otherRanger: false, admin: true },
  "notice:read": { anonymous: false, rider: false, ranger: true, manager: true, otherRanger: false, admin: true },
  "reports:export": { anonymous: false, rider: false, ranger: true, manager: true, otherRanger: false, admin: true },
  "audit:read": { anonymous: false, rider: false, ranger: true, manager: true, otherRanger: false, admin: true },
  "own:setups": { anonymous: false, rider: true, ranger: true, manager: true, otherRanger: true, admin: true },
  "own:ride-logs": { anonymous: false, rider: true, ranger: true, manager: true, otherRanger: true, admin: true },
  "own:subscriptions": { anonymous: false, rider: true, ranger: true, manager: true, otherRanger: true, admin: true },
  "own:units": { anonymous: false, rider: true, ranger: true, manager: true, otherRanger: true, admin: true },
  "own:account": { anonymous: false, rider: true, ranger: true, manager: true, otherRanger: true, admin: true },
  "dev:mail": { anonymous: false, rider: false, ranger: false, manager: false, otherRanger: false, admin: true },
};

describe("permissions matrix", () => {
  it("covers every action the module knows", () => {
    expect(Object.keys(expected).sort()).toEqual(Object.keys(ACTIONS).sort());
  });

  for (const action of Object.keys(ACTIONS) as Action[]) {
    for (const [who, actor] of Object.entries(actors)) {
      it(`${who} → ${action}`, () => {
        const scope = ACTIONS[action] === "owner" ? { ownerId: actor?.id } : { parkId: PARK };
        expect(can(actor, action, scope)).toBe(expected[action][who]);
      });
    }
  }

  it("owner actions refuse another user's object, even for admins", () => {
    expect(can(actors.rider, "own:setups", { ownerId: "someone-else" })).toBe(false);
    expect(can(actors.admin, "own:setups", { ownerId: "someone-else" })).toBe(false);
  });

  it("authorize throws 401 for anonymous and 403 for the wrong role", () => {
    expect(() => authorize(null, "report:write", { parkId: PARK })).toThrowError(AppError);
    try {
      authorize(null, "report:write", { parkId: PARK });
    } catch (e) {
      expect((e as AppError).status).toBe(401);
    }
    try {
      authorize(actors.otherRanger, "report:write", { parkId: PARK });
    } catch (e) {
      expect((e as AppError).status).toBe(403);
    }
  });

  it("names the navigation role", () => {
    expect(primaryRole(actors.anonymous)).toBe("anonymous");
    expect(primaryRole(actors.rider)).toBe("rider");
    expect(primaryRole(actors.ranger)).toBe("ranger");
    expect(primaryRole(actors.manager)).toBe("manager");
    expect(primaryRole(actors.admin)).toBe("admin");
  });
});
