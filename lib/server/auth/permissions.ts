import "server-only";
import { AppError } from "@/lib/shared/errors";
import type { ParkRole } from "@/models/park-membership";

/**
 * Who may do what: the one place that decides. Pure, so it is unit-tested for every
 * role × action. Server code loads the Actor fresh from the database (lib/server/auth/actor.ts)
 * and calls `authorize` before acting.
 */
export type { ParkRole };
export type Actor = {
  id: string;
  email: string;
  name: string;
  siteRole: "admin" | "rider";
  memberships: { parkId: string; role: ParkRole }[];
};

export const ACTIONS = {
  "park:create": "site",
  "park:update": "park",
  "staff:invite": "park",
  "team:read": "park",
  "team:manage": "park",
  "trail:write": "park",
  "report:write": "park",
  "hazard:write": "park",
  "notice:send": "park",
  "notice:read": "park",
  "reports:export": "park",
  "audit:read": "park",
  "own:setups": "owner",
  "own:ride-logs": "owner",
  "own:subscriptions": "owner",
  "own:units": "owner",
  "own:account": "owner",
  "dev:mail": "site",
} as const;
export type Action = keyof typeof ACTIONS;

/** Which park roles may take each park-scoped action (admins may take all). */
const PARK_ROLES: Partial<Record<Action, ParkRole[]>> = {
  "park:update": ["manager"],
  "staff:invite": ["manager"],
  "team:read": ["manager", "ranger"],
  "team:manage": ["manager"],
  "trail:write": ["manager", "ranger"],
  "report:write": ["manager", "ranger"],
  "hazard:write": ["manager", "ranger"],
  "notice:send": ["manager", "ranger"],
  "notice:read": ["manager", "ranger"],
  "reports:export": ["manager", "ranger"],
  "audit:read": ["manager", "ranger"],
};

export type Scope = { parkId?: string; ownerId?: string };

export function can(actor: Actor | null, action: Action, scope: Scope = {}): boolean {
  if (!actor) return false;
  const kind = ACTIONS[action];
  if (kind === "owner") return Boolean(scope.ownerId) && scope.ownerId === actor.id;
  if (actor.siteRole === "admin") return true;
  if (kind === "site") return false;
  const allowed = PARK_ROLES[action] ?? [];
  return actor.memberships.some((m) => m.parkId === scope.parkId && allowed.includes(m.role));
}

/** Throws 401 for anonymous callers and 403 for signed-in callers without the right. */
export function authorize(actor: Actor | null, action: Action, scope: Scope = {}): asserts actor is Actor {
  if (!actor) throw new AppError(401, "Sign in first.");
  if (!can(actor, action, scope)) throw new AppError(403, "You do not have permission to do that.");
}

export function roleInPark(actor: Actor | null, parkId: string): ParkRole | "admin" | null {
  if (!actor) return null;
  if (actor.siteRole === "admin") return "admin";
  return actor.memberships.find((m) => m.parkId === parkId)?.role ?? null;
}

/** The label shown in navigation: the highest role the actor holds anywhere. */
export function primaryRole(actor: Actor | null): "admin" | "manager" | "ranger" | "rider" | "anonymous" {
  if (!actor) return "anonymous";
  if (actor.siteRole === "admin") return "admin";
  if (actor.memberships.some((m) => m.role === "manager")) return "manager";
  if (actor.memberships.some((m) => m.role === "ranger")) return "ranger";
  return "rider";
}
