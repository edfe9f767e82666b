import "server-only";
/** The park-wide state staff set ("whole park closed: lightning") and clear. One in force at a time. */
import { Op, type Transaction } from "sequelize";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { parkStateSchema, type ParkStateKind } from "@/lib/conditions/pure/schemas";
import { recordAudit } from "@/lib/audit/record";
import { ParkState, sequelize, type Park } from "@/models";

export type ParkStateView = { id: string; state: ParkStateKind; message: string; startsAt: string; endsAt: string | null };

export const parkStateView = (s: ParkState): ParkStateView => ({
  id: s.id,
  state: s.state,
  message: s.message,
  startsAt: new Date(s.startsAt).toISOString(),
  endsAt: s.endsAt ? new Date(s.endsAt).toISOString() : null,
});

/** States not cleared and not yet over (a future one counts: it is replaced or cleared too). */
const openStates = (parkId: string, now: Date) => ({
  parkId,
  clearedAt: null,
  [Op.or]: [{ endsAt: null }, { endsAt: { [Op.gt]: now } }],
});

async function clearOpen(parkId: string, now: Date, transaction: Transaction): Promise<number> {
  const [count] = await ParkState.update({ clearedAt: now }, { where: openStates(parkId, now), transaction });
  return count;
}

/** The state in force at `now`, if any (the board reads it in its own single query). */
export async function activeParkState(parkId: string, now = new Date()): Promise<ParkStateView | null> {
  const row = await ParkState.findOne({
    where: { ...openStates(parkId, now), startsAt: { [Op.lte]: now } },
    order: [["startsAt", "DESC"]],
  });
  return row ? parkStateView(row) : null;
}

/** POST /api/parks/{slug}/state: replaces whatever state was set before. */
export async function setParkState(actor: Actor | null, park: Park, body: unknown, options: { now?: Date } = {}): Promise<ParkStateView> {
  authorize(actor, "report:write", { parkId: park.id });
  const input = parkStateSchema.parse(body);
  const now = options.now ?? new Date();
  return sequelize.transaction(async (transaction) => {
    await clearOpen(park.id, now, transaction);
    const row = await ParkState.create(
      {
        parkId: park.id,
        state: input.state,
        message: input.message,
        startsAt: input.startsAt ? new Date(input.startsAt) : now,
        endsAt: input.endsAt ? new Date(input.endsAt) : null,
        createdBy: actor.id,
      },
      { transaction },
    );
    await recordAudit({ parkId: park.id, actorId: actor.id, action: "park-state.set", subjectType: "park", subjectId: park.id, data: { state: input.state, message: input.message } }, transaction);
    return parkStateView(row);
  });
}

/** DELETE /api/parks/{slug}/state: the park goes back to each trail's own status. */
export async function clearParkState(actor: Actor | null, park: Park, options: { now?: Date } = {}): Promise<{ cleared: number }> {
  authorize(actor, "report:write", { parkId: park.id });
  const now = options.now ?? new Date();
  return sequelize.transaction(async (transaction) => {
    const cleared = await clearOpen(park.id, now, transaction);
    if (cleared) {
      await recordAudit({ parkId: park.id, actorId: actor.id, action: "park-state.clear", subjectType: "park", subjectId: park.id, data: { cleared } }, transaction);
    }
    return { cleared };
  });
}
