import { afterAll, describe, expect, it } from "vitest";
import { GEOJSON_CONTENT_TYPE, geoJsonResponse } from "@/lib/server/api/geojson-response";
import { parkToday } from "@/lib/conditions/park-today";
import { parkFeaturesGeoJson, parkHazardsGeoJson, parkTrailsGeoJson } from "@/lib/map/map-queries";
import { shiftDate } from "@/lib/shared/park-clock";
import { trailMapPropertiesSchema } from "@/lib/map/pure/schemas";
import { Hazard, TrailFeature, TrailReport, sequelize, type Trail } from "@/models";
import { createPark } from "../helpers";
import { createTrail, line } from "./fixtures";

afterAll(() => sequelize.close());

const report = (trail: Trail, reportDate: string, status: "open" | "caution" | "closed", reportedAt: Date, extra: Partial<TrailReport> = {}) =>
  TrailReport.create({ trailId: trail.id, parkId: trail.parkId, reportDate, status, reason: null, surfaces: ["tacky"], features: {}, note: null, reporterId: null, reportedAt, ...extra });

describe("trails.geojson for a park", () => {
  it("gives each trail today's status, surfaces and last inspection; yesterday's report is not today's status", async () => {
    const park = await createPark();
    const [a, b, c] = [await createTrail(park, "Alder Run"), await createTrail(park, "Birch Line", { geometry: line(0.002), simplified: line(0.002) }), await createTrail(park, "Cairn Drop")];
    await createTrail(park, "Old Line", { archivedAt: new Date() });
    const now = new Date();
    const day = parkToday(park, now);
    // Alder: corrected today (revision 2 current); Birch: only yesterday; Cairn: never.
    await report(a, day, "open", new Date(now.getTime() - 3_600_000), { isCurrent: false });
    await report(a, day, "closed", new Date(now.getTime() - 600_000), { revision: 2, surfaces: ["muddy", "wet"] });
    const yesterdayAt = new Date(now.getTime() - 86_400_000);
    await report(b, shiftDate(day, -1), "caution", yesterdayAt);

    const { collection } = await parkTrailsGeoJson(park, now);
    expect(collection.features.map((f) => f.properties.name)).toEqual(["Alder Run", "Birch Line", "Cairn Drop"]);
    const [alder, birch, cairn] = collection.features.map((f) => trailMapPropertiesSchema.strict().parse(f.properties));
    expect(alder).toMatchObject({ id: a.id, status: "closed", statusLabel: "Closed", surfaces: ["muddy", "wet"], lengthM: 1093, descentM: 100, maxGradePct: 11.3 });
    expect(new Date(alder.lastReportAt!).getTime()).toBe(new Date(now.getTime() - 600_000).getTime());
    expect(birch).toMatchObject({ id: b.id, status: null, statusLabel: "Not inspected today", surfaces: [] });
    expect(new Date(birch.lastReportAt!).getTime()).toBe(yesterdayAt.getTime());
    expect(cairn).toMatchObject({ id: c.id, status: null, lastReportAt: null });
    expect(collection.features[1].geometry).toEqual(line(0.002));
  });

  it("is served as application/geo+json with an ETag, and a matching If-None-Match gets 304", async () => {
    const park = await createPark();
    await createTrail(park, "Dune Flow");
    const { collection } = await parkTrailsGeoJson(park);
    const response = geoJsonResponse(collection);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe(`${GEOJSON_CONTENT_TYPE}; charset=utf-8`);
    const body = await response.json();
    expect(body.type).toBe("FeatureCollection");
    expect(body.features[0].properties.name).toBe("Dune Flow");
    const etag = response.headers.get("etag")!;
    const again = geoJsonResponse(collection, new Request("http://localhost/x", { headers: { "if-none-match": etag } }));
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");
  });

  it("lists only the park's open hazards and its trails' features", async () => {
    const [park, other] = [await createPark(), await createPark()];
    const trail = await createTrail(park, "Elm Chute");
    const otherTrail = await createTrail(other, "Not Ours");
    await Hazard.create({ parkId: park.id, trailId: trail.id, kind: "washed-out-berm", note: "Lip gone", lon: 8.505, lat: 46.8, reportedBy: null });
    await Hazard.create({ parkId: park.id, trailId: null, kind: "fallen-tree", note: null, lon: 8.506, lat: 46.8, reportedBy: null, resolvedAt: new Date() });
    await Hazard.create({ parkId: other.id, trailId: otherTrail.id, kind: "fallen-tree", note: null, lon: 8.506, lat: 46.8, reportedBy: null });
    await TrailFeature.create({ trailId: trail.id, kind: "jump", name: "Hop", size: null, lon: 8.505, lat: 46.8, distanceAlongM: 380 });
    await TrailFeature.create({ trailId: otherTrail.id, kind: "drop", name: null, size: null, lon: 8.505, lat: 46.8, distanceAlongM: 380 });

    const hazards = await parkHazardsGeoJson(park.id);
    expect(hazards.features.map((f) => f.properties.kindLabel)).toEqual(["washed out berm"]);
    const features = await parkFeaturesGeoJson(park.id);
    expect(features.features.map((f) => [f.properties.label, f.properties.trailName])).toEqual([["jump: Hop", "Elm Chute"]]);
  });
});
