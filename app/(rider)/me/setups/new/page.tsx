import Link from "next/link";
import { SetupEditor } from "@/components/pressure/setup-editor";
import { getActor } from "@/lib/server/auth/actor";
import { unitsFor } from "@/lib/accounts/units";

export const metadata = { title: "New setup" };
export const dynamic = "force-dynamic";

export default async function NewSetupPage() {
  const units = await unitsFor(await getActor());
  return (
    <section className="space-y-4">
      <p><Link href="/me/setups" className="font-semibold underline">My setups</Link> › New</p>
      <h1 className="text-3xl font-extrabold">New setup</h1>
      <SetupEditor units={{ pressure: units.pressure, mass: units.mass }} />
    </section>
  );
}
