/**
 * The second demo park, Cinder Hollow Shuttle Park (fictional), so it is not empty: three trails
 * from the shuttle drop to the car park, its ground (boundary, shuttle road, landmarks, contours of
 * the terrain the trails and road are laid on) and a week
 * of morning checks by its ranger. Lines are synthesised (scripts/demo) and go through the same
 * upload code as a real file; reports through the same write as the API, dated at the park.
 */
import { loadActor } from "@/lib/server/auth/actor";
import { postTrailReport } from "@/lib/conditions/write-report";
import { parkLocalInstant, parkLocalDate, shiftDate } from "@/lib/shared/park-clock";
import { createTrailFromUpload } from "@/lib/trails/save-upload";
import { DROP, LOT, SECOND_PARK_TRAILS, secondParkContours, secondParkRoad, secondParkTrailFile } from "@/scripts/demo/second-park";
import { Park, Trail, TrailReport, User } from "@/models";
import { WEEK, demoReport } from "./demo-conditions/scenario";

const feature = (geometry: GeoJSON.Geometry, properties: Record<string, unknown>) => ({ type: "Feature" as const, properties, geometry });
const collection = (...features: ReturnType<typeof feature>[]) => ({ type: "FeatureCollection" as const, features });

export async function up() {
  const park = await Park.findOne({ where: { slug: "cinder-hollow" } });
  const ranger = await User.findOne({ where: { email: "ranger@cinder.loamcast.test" } });
  const actor = ranger && (await loadActor(ranger.id));
  if (!park || !actor) throw new Error("Run the demo accounts seeder first.");

  for (const [i, trail] of SECOND_PARK_TRAILS.entries()) {
    await createTrailFromUpload(actor, park, secondParkTrailFile(trail, i), { name: trail.name, difficulty: trail.difficulty, kind: trail.kind, direction: "downhill" });
  }

  const trails = await Trail.findAll({ where: { parkId: park.id }, order: [["name", "ASC"]] });
  const road = secondParkRoad();
  const lons = [...trails.flatMap((t) => [t.minLon, t.maxLon]), ...road.map((p) => p[0])];
  const lats = [...trails.flatMap((t) => [t.minLat, t.maxLat]), ...road.map((p) => p[1])];
  const [w, e, s, n] = [Math.min(...lons) - 0.003, Math.max(...lons) + 0.003, Math.min(...lats) - 0.003, Math.max(...lats) + 0.003];
  await park.update({
    mapLayers: {
      boundary: collection(feature({ type: "Polygon", coordinates: [[[w, s], [e, s], [e, n], [w, n], [w, s]]] }, { name: "Cinder Hollow boundary (fictional)" })),
      roads: collection(feature({ type: "LineString", coordinates: road }, { name: "Shuttle road" })),
      contours: secondParkContours([w, s, e, n]),
      landmarks: collection(
        feature({ type: "Point", coordinates: [DROP.lon, DROP.lat] }, { name: "Shuttle drop", elevationM: DROP.ele }),
        feature({ type: "Point", coordinates: [LOT.lon, LOT.lat] }, { name: "Car park and pick-up", elevationM: LOT.ele }),
        feature({ type: "Point", coordinates: [LOT.lon + 0.0012, LOT.lat + 0.0004] }, { name: "First aid" }),
      ),
    },
  });

  // A week of morning checks: the ranger starts at 07:15 park time, five minutes a trail.
  const now = new Date();
  const today = parkLocalDate(now, park.timeZone);
  for (const { offset, kind } of WEEK) {
    const date = shiftDate(today, offset);
    for (const [index, trail] of trails.entries()) {
      const minutes = 7 * 60 + 15 + index * 5;
      const postedAt = parkLocalInstant(date, `${String(Math.floor(minutes / 60)).padStart(2, "0")}:${String(minutes % 60).padStart(2, "0")}`, park.timeZone);
      if (postedAt <= now) await postTrailReport(actor, trail.id, demoReport(trail.name, kind), { now: postedAt });
    }
  }
}

export async function down() {
  const park = await Park.findOne({ where: { slug: "cinder-hollow" } });
  if (!park) return;
  await TrailReport.destroy({ where: { parkId: park.id } });
  await Trail.destroy({ where: { parkId: park.id } });
  await park.update({ mapLayers: {} });
}
