// An archived trail's open hazards leave the public hazard layer and map (and its cached
// hazards.geojson), while the staff hazard list and staff map keep them to resolve.
// OWASP ASVS v5.0.0 8.2.2 (data shown only to those it is meant for: a retired trail's hazard
// pins no longer mislead the public).
import { afterAll, describe, expect, it } from "vitest";
import { hazardsGeoJsonAnswer, openHazards as staffMapHazards, parkHazardsGeoJson } from "@/lib/map/map-queries";
import { openHazards as staffHazardList } from "@/lib/hazards/hazard-queries";
import { archiveTrail } from "@/lib/trails/edit-trail";
import { Hazard, sequelize } from "@/models";
import { createPark } from "../helpers";
import { personIn } from "../trails/fixtures";
import { createTrail } from "./fixtures";

afterAll(() => sequelize.close());

const ids = (answer: unknown) => (JSON.parse(String(answer)) as { features: { properties: { id: string } }[] }).features.map((f) => f.properties.id).sort();

describe("archiving a trail", () => {
  it("takes its open hazards off the public layer and the cached hazards.geojson; staff still list them", async () => {
    const park = await createPark();
    const manager = await personIn(park.id, "manager");
    const [kept, retired] = [await createTrail(park, "Spruce Flow"), await createTrail(park, "Old Quarry")];
    const onKept = await Hazard.create({ parkId: park.id, trailId: kept.id, kind: "fallen-tree", note: null, lon: 8.505, lat: 46.8, reportedBy: null });
    const onRetired = await Hazard.create({ parkId: park.id, trailId: retired.id, kind: "washed-out-berm", note: "Lip gone", lon: 8.506, lat: 46.8, reportedBy: null });
    const offTrail = await Hazard.create({ parkId: park.id, trailId: null, kind: "fallen-tree", note: null, lon: 8.507, lat: 46.8, reportedBy: null });

    const before = await hazardsGeoJsonAnswer(park.slug);
    expect(ids(before!.text)).toEqual([onKept.id, onRetired.id, offTrail.id].sort());

    await archiveTrail(manager, retired.id);

    const publicLayer = (await parkHazardsGeoJson(park.id)).features.map((f) => f.properties.id).sort();
    expect(publicLayer).toEqual([onKept.id, offTrail.id].sort());
    const cached = await hazardsGeoJsonAnswer(park.slug);
    expect(ids(cached!.text)).toEqual([onKept.id, offTrail.id].sort());
    // Staff keep seeing it so it can still be resolved.
    expect((await staffHazardList(park.id)).map((h) => h.id)).toContain(onRetired.id);
    expect((await staffMapHazards(park.id)).map((h) => h.id)).toContain(onRetired.id);
  });
});
