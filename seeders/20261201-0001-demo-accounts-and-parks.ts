/**
 * The demo scenario (fictional): Harrow Ridge Bike Park and its team, plus a second small
 * fictional park so cross-park permissions can be tried. Demo accounts exist only here.
 */
import bcrypt from "bcryptjs";
import { Park, ParkMembership, User } from "@/models";

export const DEMO_PASSWORD = "ridgeline-demo-7";

const ACCOUNTS = [
  { email: "admin@demo.loamcast.test", name: "Ada Admin", siteRole: "admin" as const },
  { email: "manager@demo.loamcast.test", name: "Mara Quill", siteRole: "rider" as const },
  { email: "ranger@demo.loamcast.test", name: "Rowan Tallis", siteRole: "rider" as const },
  { email: "rider@demo.loamcast.test", name: "Remy Okafor", siteRole: "rider" as const },
  { email: "rider2@demo.loamcast.test", name: "Jun Albrecht", siteRole: "rider" as const },
  { email: "ranger@cinder.loamcast.test", name: "Cass Pell", siteRole: "rider" as const },
];

export async function up() {
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 10);
  const users = new Map<string, User>();
  for (const account of ACCOUNTS) {
    users.set(account.email, await User.create({ ...account, passwordHash, disabledAt: null, emailVerifiedAt: new Date(), units: { pressure: "psi", mass: "kg", distance: "metric" } }));
  }
  const harrow = await Park.create({
    slug: "harrow-ridge",
    name: "Harrow Ridge Bike Park",
    timeZone: "America/Los_Angeles",
    centerLon: -121.94,
    centerLat: 47.3,
    baseElevationM: 620,
    summitElevationM: 1340,
    fictional: true,
  });
  const cinder = await Park.create({
    slug: "cinder-hollow",
    name: "Cinder Hollow Shuttle Park",
    timeZone: "America/Denver",
    centerLon: -105.61,
    centerLat: 39.02,
    baseElevationM: 2450,
    summitElevationM: 2980,
    fictional: true,
  });
  await ParkMembership.bulkCreate([
    { parkId: harrow.id, userId: users.get("manager@demo.loamcast.test")!.id, role: "manager" },
    { parkId: harrow.id, userId: users.get("ranger@demo.loamcast.test")!.id, role: "ranger" },
    { parkId: cinder.id, userId: users.get("ranger@cinder.loamcast.test")!.id, role: "ranger" },
  ]);
}

export async function down() {
  await Park.destroy({ where: { slug: ["harrow-ridge", "cinder-hollow"] } });
  await User.destroy({ where: { email: ACCOUNTS.map((a) => a.email) } });
}
