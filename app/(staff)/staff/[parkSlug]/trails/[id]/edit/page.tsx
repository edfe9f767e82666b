import Link from "next/link";
import { notFound } from "next/navigation";
import { getActor } from "@/lib/server/auth/actor";
import { getTrailDetail } from "@/lib/trails/queries";
import { distanceSystemFor } from "@/lib/accounts/user-units";
import { ArchiveTrailButton } from "./archive-button";
import { FeaturesEditor } from "./features-editor";
import { TrailMetadataForm } from "./metadata-form";
import { ReplaceLineForm } from "./replace-line-form";
import { requireParkAccess } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";
export const metadata = { title: "Edit trail" };

export default async function EditTrailPage({ params }: { params: Promise<{ parkSlug: string; id: string }> }) {
  const { parkSlug, id } = await params;
  const [actor, park] = await Promise.all([getActor(), requireParkAccess(parkSlug, "trail:write")]);
  const trail = await getTrailDetail(id, actor).catch(() => null);
  if (!trail || trail.park.slug !== park.slug || trail.archivedAt) notFound();
  const system = await distanceSystemFor(actor);

  return (
    <section className="space-y-4">
      <p className="text-sm font-semibold text-loam-600">
        <Link href={`/staff/${park.slug}`} className="underline-offset-4 hover:underline">{park.name}: staff desk</Link>
        {" · "}
        <Link href={`/trails/${trail.id}`} className="underline-offset-4 hover:underline">trail page</Link>
      </p>
      <h1 className="text-2xl font-bold">Edit {trail.name}</h1>
      <TrailMetadataForm
        trailId={trail.id}
        initial={{ name: trail.name, difficulty: trail.difficulty, kind: trail.kind, direction: trail.direction, lockVersion: trail.lockVersion }}
      />
      <FeaturesEditor trailId={trail.id} features={trail.features} system={system} />
      <ReplaceLineForm trailId={trail.id} currentVersion={trail.currentVersion} />
      <ArchiveTrailButton trailId={trail.id} trailName={trail.name} parkSlug={park.slug} />
    </section>
  );
}
