import { notFound } from "next/navigation";
import { Park } from "@/models";

export const dynamic = "force-dynamic";

export default async function ParkPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const { parkSlug } = await params;
  const park = await Park.findOne({ where: { slug: parkSlug } });
  if (!park) notFound();
  return (
    <section className="space-y-3">
      <h1 className="text-2xl font-bold">{park.name}</h1>
      {park.fictional && <p className="text-xs font-semibold uppercase tracking-wide text-flare-700">Fictional demo park</p>}
      <p>
        Base {park.baseElevationM} m · summit {park.summitElevationM} m · {park.timeZone}
      </p>
    </section>
  );
}
