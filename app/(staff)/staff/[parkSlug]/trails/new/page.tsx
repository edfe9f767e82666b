import Link from "next/link";
import { getActor } from "@/lib/server/auth/actor";
import { distanceSystemFor } from "@/lib/accounts/user-units";
import { TrailUploadForm } from "./upload-form";
import { requireParkAccess } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";
export const metadata = { title: "Upload a trail" };

export default async function NewTrailPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const { parkSlug } = await params;
  const [actor, park] = await Promise.all([getActor(), requireParkAccess(parkSlug, "trail:write")]);
  return (
    <section className="space-y-4">
      <p className="text-sm font-semibold text-loam-600">
        <Link href={`/staff/${park.slug}`} className="underline-offset-4 hover:underline">{park.name}: staff desk</Link>
      </p>
      <h1 className="text-2xl font-bold">Upload a trail</h1>
      <p className="text-sm">
        Export the line from your GPS or mapping app as GPX 1.1 or GeoJSON. Loamcast checks it, measures length, climb, descent and grades, and suggests a rating before anything is saved.
      </p>
      <TrailUploadForm parkSlug={park.slug} system={await distanceSystemFor(actor)} />
    </section>
  );
}
