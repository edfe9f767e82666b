import "server-only";
import { getServerSession } from "next-auth";
import { cache } from "react";
import { ParkMembership, User } from "@/models";
import { authOptions } from "./options";
import type { Actor } from "./permissions";

/**
 * The signed-in user, re-read from the database on every call (ASVS v5.0.0 8.3.2):
 * a role change, a disabled account or an ended session (7.4.1) takes effect at once,
 * whatever the JWT says. Wrapped in React's cache(), so the header, layout and page of one
 * request share one read.
 */
export const getActor = cache(async (): Promise<Actor | null> => {
  const session = await readSession();
  const userId = session?.user?.id;
  if (!userId) return null;
  return loadActor(userId, session.user?.sessionVersion ?? -1);
});

/** A cookie that does not decode (junk, an old secret) is no session at all, not an error. */
async function readSession() {
  try {
    return await getServerSession(authOptions);
  } catch (error) {
    console.warn("[auth] unreadable session cookie treated as signed out:", (error as Error).message);
    return null;
  }
}

/**
 * The account behind a session issued under `sessionVersion`, or null once that session has ended.
 * Without a version (seeds, scripts, tests acting for a user) only the account's state counts.
 */
export async function loadActor(userId: string, sessionVersion?: number): Promise<Actor | null> {
  const user = await User.findByPk(userId, {
    include: [{ model: ParkMembership, as: "memberships", attributes: ["parkId", "role"] }],
    // From the primary, so a role change or a disabled account counts from the next request.
    useMaster: true,
  });
  if (!user || user.disabledAt || !user.emailVerifiedAt) return null;
  if (sessionVersion !== undefined && user.sessionVersion !== sessionVersion) return null;
  const memberships = ((user as unknown as { memberships?: ParkMembership[] }).memberships ?? []).map((m) => ({
    parkId: m.parkId,
    role: m.role,
  }));
  return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole, memberships };
}
