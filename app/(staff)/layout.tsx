import { redirect } from "next/navigation";
import { getActor } from "@/lib/server/auth/actor";
import { primaryRole } from "@/lib/server/auth/permissions";

/** Staff pages: anonymous visitors go to sign in; riders without a park role are refused. */
export default async function StaffLayout({ children }: { children: React.ReactNode }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/staff");
  if (primaryRole(actor) === "rider") {
    return (
      <section className="card space-y-2" data-testid="refused">
        <h1 className="text-2xl font-bold">Staff only</h1>
        <p>This part of Loamcast is for park managers and rangers. Ask your park manager for an invitation.</p>
      </section>
    );
  }
  return <>{children}</>;
}
