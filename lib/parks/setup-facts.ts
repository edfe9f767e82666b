import "server-only";
import { Op } from "sequelize";
import { ParkMembership, Subscription, Trail, TrailReport, type Park } from "@/models";
import { setupChecklist } from "./pure/setup-checklist";

/** Reads what the set-up checklist is ticked from: one count per item. */
export async function parkSetupChecklist(park: Park) {
  const [trails, members, reports, subscribers] = await Promise.all([
    Trail.count({ where: { parkId: park.id, archivedAt: null } }),
    ParkMembership.count({ where: { parkId: park.id } }),
    TrailReport.count({ where: { parkId: park.id } }),
    Subscription.count({ where: { parkId: park.id, confirmedAt: { [Op.ne]: null }, unsubscribedAt: null } }),
  ]);
  const groundLayers = Object.values(park.mapLayers ?? {}).filter((layer) => layer?.features.length).length;
  return setupChecklist(park.slug, { settingsSaved: park.lockVersion > 0 || Boolean(park.contactEmail), groundLayers, trails, members, reports, subscribers });
}
