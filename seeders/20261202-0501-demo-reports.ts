/**
 * A week of conditions for the demo park, ending today at the park (fictional): reports,
 * one correction, a closure after rain, hazards with photos of our own making and one
 * resolved hazard. Everything is written through the same lib functions as the API, with
 * `now` set to the moment each ranger posted; photos go through the storage interface.
 */
import { loadActor } from "@/lib/server/auth/actor";
import type { Actor } from "@/lib/server/auth/permissions";
import { createHazard, updateHazard } from "@/lib/hazards/hazard-writes";
import { parkLocalInstant, parkLocalDate, shiftDate } from "@/lib/shared/park-clock";
import { postTrailReport } from "@/lib/conditions/write-report";
import { photoStorage } from "@/lib/server/storage";
import { Hazard, Park, ParkState, Photo, Trail, TrailReport, User } from "@/models";
import { demoPhoto } from "./demo-conditions/photos";
import { RAINY_DAY_CORRECTION, WEEK, demoReport } from "./demo-conditions/scenario";

async function actorFor(email: string): Promise<Actor> {
  const user = await User.findOne({ where: { email } });
  const actor = user && (await loadActor(user.id));
  if (!actor) throw new Error(`Run the demo accounts seeder first (${email} missing).`);
  return actor;
}

/** Minutes after midnight as "HH:MM". */
const clock = (minutes: number) => `${String(Math.floor(minutes / 60)).padStart(2, "0")}:${String(minutes % 60).padStart(2, "0")}`;

export async function up() {
  const park = await Park.findOne({ where: { slug: "harrow-ridge" } });
  if (!park) throw new Error("Run the demo accounts seeder first.");
  const trails = await Trail.findAll({ where: { parkId: park.id, archivedAt: null }, order: [["name", "ASC"]] });
  if (trails.length === 0) throw new Error("Run the demo trails seeder first.");
  const ranger = await actorFor("ranger@demo.loamcast.test");
  const manager = await actorFor("manager@demo.loamcast.test");
  const now = new Date();
  const today = parkLocalDate(now, park.timeZone);
  const at = (date: string, minutes: number) => parkLocalInstant(date, clock(minutes), park.timeZone);

  for (const { offset, kind } of WEEK) {
    const date = shiftDate(today, offset);
    const who = offset % 3 === 0 ? manager : ranger;
    for (const [index, trail] of trails.entries()) {
      // The check starts at 06:30 and takes about four minutes a trail. Today's reports are
      // written only for inspections that have already happened at the park's clock.
      const postedAt = at(date, 6 * 60 + 30 + index * 4);
      if (postedAt > now) continue;
      await postTrailReport(who, trail.id, demoReport(trail.name, kind), { now: postedAt });
      if (kind === "rain" && trail.name === RAINY_DAY_CORRECTION.trailName) {
        await postTrailReport(who, trail.id, { ...RAINY_DAY_CORRECTION.report, baseRevision: 1 }, { now: at(date, 9 * 60 + 10) });
      }
    }
  }

  const byName = new Map(trails.map((t) => [t.name, t]));
  const yesterday = shiftDate(today, -1);
  const onTrail = (name: string) => byName.get(name)?.id ?? trails[0].id;
  await createHazard(
    ranger,
    park,
    { kind: "fallen-tree", trailId: onTrail("Gnarlroot"), distanceAlongM: "420", note: "Spruce down across the trail below the second bridge; ride around on the marked line." },
    [{ name: "tree.jpg", bytes: await demoPhoto("fallen-tree") }],
    { now: at(yesterday, 7 * 60 + 5) },
  );
  await createHazard(
    ranger,
    park,
    { kind: "wet-wooden-feature", trailId: onTrail("Slatebelt Flow"), distanceAlongM: "900", note: "North-facing boardwalk stays wet until midday." },
    [
      { name: "boardwalk-1.jpg", bytes: await demoPhoto("wet-wooden-feature", 0) },
      { name: "boardwalk-2.jpg", bytes: await demoPhoto("wet-wooden-feature", 1) },
    ],
    { now: at(yesterday, 7 * 60 + 20) },
  );
  await createHazard(
    manager,
    park,
    { kind: "machinery", lon: String(park.centerLon + 0.0015), lat: String(park.centerLat - 0.001), note: "Excavator rebuilding the lower berms near the base; follow the crew's signs." },
    [],
    { now: at(shiftDate(today, -2), 8 * 60) },
  );
  // A washout found on the rainy day and repaired two days later.
  const washout = await createHazard(
    ranger,
    park,
    { kind: "washout", trailId: onTrail("Cedar Skip"), distanceAlongM: "300", note: "Rain cut a channel across the tread." },
    [{ name: "washout.jpg", bytes: await demoPhoto("washout") }],
    { now: at(shiftDate(today, -4), 7 * 60) },
  );
  await updateHazard(manager, washout.id, { lockVersion: washout.lockVersion, resolved: true }, { now: at(shiftDate(today, -2), 15 * 60) });
}

export async function down() {
  const park = await Park.findOne({ where: { slug: "harrow-ridge" } });
  if (!park) return;
  const hazards = await Hazard.findAll({ where: { parkId: park.id }, attributes: ["id"] });
  const photos = await Photo.findAll({ where: { hazardId: hazards.map((h) => h.id) } });
  for (const photo of photos) {
    await photoStorage().delete(photo.storageKey);
    await photoStorage().delete(photo.thumbKey);
  }
  await Hazard.destroy({ where: { parkId: park.id } });
  await ParkState.destroy({ where: { parkId: park.id } });
  await TrailReport.destroy({ where: { parkId: park.id } });
}
