/**
 * Confirmed subscribers for the demo park (fictional riders, `.test` addresses that reach only
 * the local fake SMTP server), so a closure notice written in the demo reaches someone and can be
 * read under *Sent mail*. They hold no password anyone knows: they exist to receive mail.
 */
import { randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { Park, Subscription, User } from "@/models";

const SUBSCRIBERS = [
  { email: "odile.fernsby@riders.loamcast.test", name: "Odile Fernsby", kinds: ["closure", "reopening", "advisory"] },
  { email: "tam.harrowgate@riders.loamcast.test", name: "Tam Harrowgate", kinds: ["closure", "reopening"] },
  { email: "wren.calloway@riders.loamcast.test", name: "Wren Calloway", kinds: ["closure", "reopening", "advisory"] },
  { email: "bex.mireland@riders.loamcast.test", name: "Bex Mireland", kinds: ["closure"] },
];

export async function up() {
  const park = await Park.findOne({ where: { slug: "harrow-ridge" } });
  if (!park) return;
  const passwordHash = await bcrypt.hash(randomBytes(24).toString("base64url"), 10);
  const confirmedAt = new Date(Date.now() - 14 * 86_400_000);
  for (const rider of SUBSCRIBERS) {
    const user = await User.create({ email: rider.email, name: rider.name, passwordHash, siteRole: "rider", disabledAt: null });
    await Subscription.create({ userId: user.id, parkId: park.id, email: rider.email, trailIds: null, kinds: rider.kinds, confirmedAt, unsubscribedAt: null, confirmationSentAt: confirmedAt });
  }
}

export async function down() {
  await User.destroy({ where: { email: SUBSCRIBERS.map((s) => s.email) } });
}
