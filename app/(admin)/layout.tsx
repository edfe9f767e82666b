import { redirect } from "next/navigation";
import { getActor } from "@/lib/server/auth/actor";

export default async function AdminLayout({ children }: { children: React.ReactNode }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/admin/parks");
  if (actor.siteRole !== "admin") {
    return (
      <section className="card" data-testid="refused">
        <h1 className="text-2xl font-bold">Admins only</h1>
      </section>
    );
  }
  return <>{children}</>;
}
