import Link from "next/link";
import { getActor } from "@/lib/auth/actor";

export const metadata = { title: "My account" };
export const dynamic = "force-dynamic";

export default async function MyAccountPage() {
  const actor = (await getActor())!;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">My account</h1>
      <div className="card">
        <p className="font-semibold">{actor.name}</p>
        <p className="text-loam-600">{actor.email}</p>
      </div>
      <Link href="/me/subscriptions" className="btn-quiet">Trail notices by e-mail</Link>
    </section>
  );
}
