import { randomUUID } from "node:crypto";
import bcrypt from "bcryptjs";
import { Park, ParkMembership, User } from "@/models";

/** A unique e-mail per call, so tests never collide with each other or the demo seed. */
export const uniqueEmail = (label = "user") => `${label}-${randomUUID().slice(0, 8)}@tests.loamcast.test`;

export async function createUser(opts: { role?: "admin" | "rider"; password?: string; email?: string } = {}) {
  return User.create({
    email: opts.email ?? uniqueEmail(),
    name: "Test Person",
    passwordHash: await bcrypt.hash(opts.password ?? "gravel-and-roots-42", 4),
    siteRole: opts.role ?? "rider",
    disabledAt: null,
    emailVerifiedAt: new Date(), // proven, as after opening the sign-up link
  });
}

export async function createPark(slug = `park-${randomUUID().slice(0, 8)}`) {
  return Park.create({ slug, name: `Test Park ${slug}`, timeZone: "Europe/Zurich", centerLon: 8.5, centerLat: 46.8, baseElevationM: 900, summitElevationM: 1800 });
}

export async function addStaff(parkId: string, userId: string, role: "manager" | "ranger") {
  return ParkMembership.create({ parkId, userId, role });
}

/** Messages the fake SMTP server received (started by npm test). */
export async function capturedMessages(): Promise<{ to: string[]; raw: string }[]> {
  const response = await fetch(`${process.env.FAKE_SMTP_CONTROL_URL}/messages`);
  return ((await response.json()) as { messages: { to: string[]; raw: string }[] }).messages;
}

/** The token of the newest link to `path` mailed to `email`, quoted-printable undone (RFC 2045 §6.7). */
export async function tokenMailedTo(email: string, path: string): Promise<string> {
  const mail = (await capturedMessages()).filter((m) => m.to.includes(email)).at(-1);
  const text = (mail?.raw ?? "").replace(/=\r?\n/g, "").replace(/=([0-9A-F]{2})/g, (_, h: string) => String.fromCharCode(parseInt(h, 16)));
  const token = new RegExp(`${path.replace(/[/?]/g, "\\$&")}\\?token=([A-Za-z0-9_%.-]+)`).exec(text)?.[1];
  if (!token) throw new Error(`no ${path} link mailed to ${email}`);
  return decodeURIComponent(token);
}
