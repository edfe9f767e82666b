import "server-only";
import { getServerSession } from "next-auth";
import { cache } from "react";
import { ParkMembership, User } from "@/models";
import { authOptions } from "./options";
import type { Actor } from "./permissions";

/**
 * The signed-in user, re-read from the database on every call (ASVS v5.0.0 8.3.2):
 * a role change or a disabled account takes effect at once, whatever the JWT says. Wrapped in React's
 * cache(), so the header, layout and page of one request share one read.
 */
export const getActor = cache(async (): Promise<Actor | null> => {
  const session = await getServerSession(authOptions);
  const userId = session?.user?.id;
  if (!userId) return null;
  return loadActor(userId);
});

export async function loadActor(userId: string): Promise<Actor | null> {
  const user = await User.findByPk(userId, {
    include: [{ model: ParkMembership, as: "memberships", attributes: ["parkId", "role"] }],
    // From the primary, so a role change or a disabled account counts from the next request.
    useMaster: true,
  });
  if (!user || user.disabledAt) return null;
  const memberships = ((user as unknown as { memberships?: ParkMembership[] }).memberships ?? []).map((m) => ({
    parkId: m.parkId,
    role: m.role,
  }));
  return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole, memberships };
}
