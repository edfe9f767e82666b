import "server-only";
import type { FeatureCollection } from "geojson";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { Park, ParkLayerVersion, sequelize } from "@/models";
import { readMultipart } from "@/lib/server/api/body";
import { MULTIPART_MARGIN_BYTES } from "@/lib/trails/receive-upload";
import { GROUND_LAYERS, GROUND_LIMITS, isGroundLayer, parseGroundLayer, type GroundLayer } from "./pure/ground-layers";
import { recordAudit } from "@/lib/audit/record";

export function groundLayerOf(value: string): GroundLayer {
  if (!isGroundLayer(value)) throw new AppError(404, `There is no ground layer "${value.slice(0, 30)}". Layers: ${GROUND_LAYERS.join(", ")}.`);
  return value;
}

/**
 * Replaces (or, with `next = null`, clears) one of the park's ground layers in one transaction:
 * the park row is locked, what the layer held is kept as a version, and the audit event is written.
 */
async function writeLayer(actor: Actor, park: Park, layer: GroundLayer, next: FeatureCollection | null) {
  return sequelize.transaction(async (transaction) => {
    const locked = await Park.findByPk(park.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!locked) throw new AppError(404, "Park not found.");
    const { [layer]: previous, ...others } = locked.mapLayers ?? {};
    if (previous?.features.length) await ParkLayerVersion.create({ parkId: park.id, layer, geojson: previous, replacedBy: actor.id }, { transaction });
    await locked.update({ mapLayers: next ? { ...others, [layer]: next } : others }, { transaction });
    await recordAudit({ parkId: park.id, actorId: actor.id, action: next ? "ground.replace" : "ground.clear", subjectType: "park", subjectId: park.id, data: { layer, features: next?.features.length ?? 0 } }, transaction);
    return { layer, features: next?.features.length ?? 0 };
  });
}

/**
 * A manager uploads a layer file (multipart, one field "file"): who is asking and which layer are
 * checked before a byte is read, the file is validated in full before anything is written.
 */
export async function replaceGroundLayer(actor: Actor | null, park: Park, layerName: string, request: Request) {
  authorize(actor, "park:update", { parkId: park.id });
  const layer = groundLayerOf(layerName);
  const { fields, files } = await readMultipart(request, GROUND_LIMITS.maxFileBytes + MULTIPART_MARGIN_BYTES);
  const stray = Object.keys(fields)[0] ?? files.find((f) => f.field !== "file")?.field;
  if (stray !== undefined) throw new AppError(400, `The upload form has no field "${stray.slice(0, 40)}".`, stray.slice(0, 40));
  if (files.length !== 1) throw new AppError(400, "Choose one GeoJSON file to upload.", "file");
  const [{ name, bytes }] = files;
  if (!/\.(geo)?json$/i.test(name)) throw new AppError(415, "Upload the layer as GeoJSON (a .geojson or .json file).", "file");
  const collection = parseGroundLayer(layer, bytes, { lon: park.centerLon, lat: park.centerLat });
  return writeLayer(actor, park, layer, collection);
}

export async function clearGroundLayer(actor: Actor | null, park: Park, layerName: string) {
  authorize(actor, "park:update", { parkId: park.id });
  const layer = groundLayerOf(layerName);
  if (!park.mapLayers?.[layer]) return { layer, features: 0 };
  return writeLayer(actor, park, layer, null);
}

/** How many shapes each layer holds now (0 = not uploaded). */
export const groundLayerCounts = (park: Park) => Object.fromEntries(GROUND_LAYERS.map((layer) => [layer, park.mapLayers?.[layer]?.features.length ?? 0])) as Record<GroundLayer, number>;

/** The park's staff see what each layer held before, newest first (the geometry stays in the database). */
export async function groundLayerHistory(parkId: string, limit = 20) {
  const rows = await ParkLayerVersion.findAll({ where: { parkId }, attributes: ["id", "layer", "replacedAt", "replacedBy", [sequelize.literal("coalesce(jsonb_array_length(geojson->'features'), 0)"), "features"]], order: [["replacedAt", "DESC"]], limit });
  return rows.map((r) => ({ id: r.id, layer: r.layer, replacedAt: r.replacedAt.toISOString(), features: Number(r.get("features")) }));
}
