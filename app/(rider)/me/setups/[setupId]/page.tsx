import Link from "next/link";
import { notFound } from "next/navigation";
import { SetupEditor } from "@/components/pressure/setup-editor";
import { getActor } from "@/lib/server/auth/actor";
import { findOwnSetup, setupView } from "@/lib/setups/setup-queries";
import { AppError } from "@/lib/shared/errors";
import { unitsFor } from "@/lib/accounts/units";

export const metadata = { title: "Edit setup" };
export const dynamic = "force-dynamic";

export default async function EditSetupPage({ params, searchParams }: { params: Promise<{ setupId: string }>; searchParams: Promise<{ saved?: string }> }) {
  const [{ setupId }, { saved }] = await Promise.all([params, searchParams]);
  const actor = await getActor();
  const row = await findOwnSetup(actor, setupId).catch((error: unknown) => {
    if (error instanceof AppError && error.status === 404) notFound();
    throw error;
  });
  const { sag: _sag, createdAt: _c, updatedAt: _u, ...setup } = setupView(row);
  const units = await unitsFor(actor);
  return (
    <section className="space-y-4">
      <p><Link href="/me/setups" className="font-semibold underline">My setups</Link> › {setup.name}</p>
      <h1 className="text-3xl font-extrabold">{setup.name}</h1>
      <Link href={`/pressure?setup=${setup.id}`} className="btn-quiet">Today&apos;s pressure with this setup</Link>
      <SetupEditor setup={setup} units={{ pressure: units.pressure, mass: units.mass }} justSaved={saved === "1"} />
    </section>
  );
}
