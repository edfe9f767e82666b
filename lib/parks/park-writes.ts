import "server-only";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { createInvitation, mailInvitation } from "@/lib/staff/invitations";
import { Park, sequelize } from "@/models";
import { parkCreateSchema, parkPatchSchema, parseParkFields, type ParkPatchInput } from "./pure/schemas";
import { parkHasTrails, parkSettings } from "./queries";
import { recordAudit } from "@/lib/audit/record";

/** Validation refusals of park settings answer 422 and name the field, for the form and the API alike. */
function parse<T>(schema: Parameters<typeof parseParkFields<T>>[0], input: unknown): T {
  const result = parseParkFields(schema, input);
  if (!result.ok) throw new AppError(422, result.message, result.field);
  return result.data;
}

const slugTaken = () => new AppError(409, "Another park already uses this address (slug). Choose another.", "slug");
const isUniqueViolation = (error: unknown) => (error as { name?: string })?.name === "SequelizeUniqueConstraintError";

/**
 * A site admin creates a park and invites its first manager in one transaction: the park exists
 * with its invitation or not at all. The e-mail goes out after the commit.
 */
export async function createPark(actor: Actor | null, input: unknown) {
  authorize(actor, "park:create");
  const { managerEmail, location, ...fields } = parse(parkCreateSchema, input);
  if (await Park.count({ where: { slug: fields.slug } })) throw slugTaken();
  try {
    const { park, invitation, token } = await sequelize.transaction(async (transaction) => {
      const park = await Park.create({ ...fields, centerLon: location.lon, centerLat: location.lat, contactEmail: fields.contactEmail ?? null, websiteUrl: fields.websiteUrl ?? null }, { transaction });
      await recordAudit({ parkId: park.id, actorId: actor.id, action: "park.create", subjectType: "park", subjectId: park.id, data: { name: park.name, slug: park.slug } }, transaction);
      const { invitation, token } = await createInvitation({ parkId: park.id, email: managerEmail, role: "manager", invitedBy: actor }, transaction);
      return { park, invitation, token };
    });
    await mailInvitation(park, invitation, token, actor.name);
    return { park: parkSettings(park), invitation: { id: invitation.id, email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt } };
  } catch (error) {
    if (isUniqueViolation(error)) throw slugTaken();
    throw error;
  }
}

/** The columns a patch touches, from the API's field names. */
function columnsOf(patch: Omit<ParkPatchInput, "lockVersion">) {
  const { location, ...rest } = patch;
  return { ...rest, ...(location ? { centerLon: location.lon, centerLat: location.lat } : {}) };
}

/**
 * A manager changes the park's settings with the lockVersion they read (409 with the current
 * values when someone saved in between). The slug is fixed once the park has trails: e-mailed
 * links and printed QR codes point at it.
 */
export async function updatePark(actor: Actor | null, slug: string, input: unknown) {
  return sequelize.transaction(async (transaction) => {
    const park = await Park.findOne({ where: { slug }, transaction, lock: transaction.LOCK.UPDATE });
    if (!park) throw new AppError(404, "Park not found.");
    authorize(actor, "park:update", { parkId: park.id });
    const { lockVersion, ...patch } = parse(parkPatchSchema, input);
    if (park.lockVersion !== lockVersion) {
      throw new AppError(409, "Someone changed these settings since you opened them. Their values are shown; make your change again.", undefined, { current: parkSettings(park) });
    }
    const base = patch.baseElevationM ?? park.baseElevationM;
    const summit = patch.summitElevationM ?? park.summitElevationM;
    if (summit <= base) throw new AppError(422, "The summit must be higher than the base.", "summitElevationM");
    if (patch.slug && patch.slug !== park.slug) {
      if (await parkHasTrails(park.id)) {
        throw new AppError(409, "The address (slug) cannot change once the park has trails: links in e-mails and QR codes depend on it.", "slug");
      }
      if (await Park.count({ where: { slug: patch.slug }, transaction })) throw slugTaken();
    }
    const before = parkSettings(park);
    await park.update({ ...columnsOf(patch), lockVersion: park.lockVersion + 1 }, { transaction });
    const after = parkSettings(park);
    const changed = (Object.keys(patch) as (keyof typeof before)[]).filter((key) => JSON.stringify(before[key]) !== JSON.stringify(after[key]));
    await recordAudit({ parkId: park.id, actorId: actor.id, action: "park.update", subjectType: "park", subjectId: park.id, data: { changed } }, transaction);
    // Board cache (#16): a settings change (time zone, name) must invalidate this park's cached board here.
    return after;
  });
}
