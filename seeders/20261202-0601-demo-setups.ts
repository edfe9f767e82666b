/**
 * Demo setups and ride logs for the fictional riders (invented values), written through the same
 * code as the API so they pass the same checks: a 29" trail bike with a baseline and a
 * mixed-wheel bike without one for rider@, a lighter rider's cross-country bike for rider2@.
 */
import { loadActor } from "@/lib/server/auth/actor";
import { createRideLog } from "@/lib/setups/ride-logs";
import { createSetup } from "@/lib/setups/setup-writes";
import { shiftDate } from "@/lib/shared/park-clock";
import { inToMm, psiToKpa } from "@/lib/shared/units";
import type { SetupInputRaw } from "@/lib/setups/pure/setup-schema";
import { Park, RideLog, Setup, Trail, User } from "@/models";

const wheel = (bsdMm: 584 | 622, inches: number, casing: "light" | "trail" | "reinforced", maxPsi: number, extra: { insert?: boolean; rimMaxPsi?: number } = {}) => ({
  bsdMm, widthMm: Number(inToMm(inches).toFixed(1)), casing, insert: extra.insert ?? false, tubeless: true, maxKpa: psiToKpa(maxPsi),
  ...(extra.rimMaxPsi ? { rimMaxKpa: psiToKpa(extra.rimMaxPsi) } : {}),
});

const SETUPS: Record<string, SetupInputRaw[]> = {
  "rider@demo.loamcast.test": [
    {
      name: "Hardpack 29er", riderMassKg: 78, bikeMassKg: 15.8, pace: "steady",
      front: wheel(622, 2.4, "trail", 50, { rimMaxPsi: 44 }), rear: wheel(622, 2.4, "trail", 50, { rimMaxPsi: 44 }),
      baseline: { frontKpa: psiToKpa(20.5), rearKpa: psiToKpa(24), surfaces: ["dry"], temperatureC: 16 },
      suspension: { rearStrokeMm: 60, rearSagMm: 17, forkTravelMm: 150, frontSagMm: 33 },
    },
    {
      name: "Mixed-wheel park bike", riderMassKg: 78, bikeMassKg: 16.9, pace: "hard",
      front: wheel(622, 2.5, "trail", 50), rear: wheel(584, 2.4, "reinforced", 50, { insert: true }),
      baseline: null,
      suspension: { rearStrokeMm: 65, rearSagMm: 22, forkTravelMm: 170, frontSagMm: 30 },
    },
  ],
  "rider2@demo.loamcast.test": [
    {
      name: "Light climber", riderMassKg: 58, bikeMassKg: 11.6, pace: "hard",
      front: wheel(622, 2.25, "light", 45), rear: wheel(622, 2.25, "light", 45),
      baseline: { frontKpa: psiToKpa(17), rearKpa: psiToKpa(19.5), surfaces: ["dry"], temperatureC: 14 },
    },
  ],
};

export async function up() {
  const park = await Park.findOne({ where: { slug: "harrow-ridge" } });
  if (!park) throw new Error("Run the demo park seeders first.");
  const trails = new Map((await Trail.findAll({ where: { parkId: park.id } })).map((t) => [t.name, t.id]));
  const ids = (...names: string[]) => names.map((n) => trails.get(n)).filter((id): id is string => Boolean(id));
  const today = new Date().toISOString().slice(0, 10);
  for (const [email, setups] of Object.entries(SETUPS)) {
    const user = await User.findOne({ where: { email } });
    const actor = user && (await loadActor(user.id));
    if (!actor) throw new Error(`Run the demo accounts seeder first (${email}).`);
    const saved = [];
    for (const setup of setups) saved.push(await createSetup(actor, setup));
    if (email !== "rider@demo.loamcast.test") continue;
    const [trailBike] = saved;
    const rides = [
      { daysAgo: 6, trailIds: ids("Cedar Skip", "Mossback Ramble"), front: 20.5, rear: 24, symptoms: { front: ["fine"], rear: ["fine"] }, surfaces: ["dry"], note: "Felt planted all morning." },
      { daysAgo: 3, trailIds: ids("Tumblewire", "Slatebelt Flow"), front: 20.5, rear: 24, symptoms: { front: [], rear: ["squirm-in-berms"] }, surfaces: ["tacky"], note: "Rear folded a little in the big berms." },
      { daysAgo: 1, trailIds: ids("Gnarlroot"), front: 19.5, rear: 24, symptoms: { front: ["sliding"], rear: [] }, surfaces: ["wet"], note: "Front washed out on wet roots." },
    ];
    for (const ride of rides) {
      await createRideLog(actor, {
        setupId: trailBike.id, riddenOn: shiftDate(today, -ride.daysAgo), parkSlug: park.slug, trailIds: ride.trailIds,
        frontKpa: psiToKpa(ride.front), rearKpa: psiToKpa(ride.rear), symptoms: ride.symptoms, surfaces: ride.surfaces, note: ride.note,
      });
    }
  }
}

export async function down() {
  const users = await User.findAll({ where: { email: Object.keys(SETUPS) } });
  const userIds = users.map((u) => u.id);
  await RideLog.destroy({ where: { userId: userIds } });
  await Setup.destroy({ where: { userId: userIds } });
}
