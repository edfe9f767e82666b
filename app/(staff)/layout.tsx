import { forbidden, redirect } from "next/navigation";
import { getActor } from "@/lib/server/auth/actor";
import { primaryRole } from "@/lib/server/auth/permissions";

/** Staff pages: anonymous visitors go to sign in; riders without a park role are refused. */
export default async function StaffLayout({ children }: { children: React.ReactNode }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/staff");
  if (primaryRole(actor) === "rider") forbidden(); // 403, not a 200 with a message
  return <>{children}</>;
}
