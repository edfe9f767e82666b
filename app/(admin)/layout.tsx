import { forbidden, redirect } from "next/navigation";
import { getActor } from "@/lib/server/auth/actor";

export default async function AdminLayout({ children }: { children: React.ReactNode }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/admin/parks");
  if (actor.siteRole !== "admin") forbidden();
  return <>{children}</>;
}
