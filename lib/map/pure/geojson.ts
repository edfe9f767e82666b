import type { Feature, FeatureCollection, LineString, MultiLineString, Point } from "geojson";
import type { TrailMapProperties } from "@/lib/map/pure/schemas";
import { statusLabel, type ReportedStatus } from "./status";

/**
 * Pure serializers from database rows (or anything shaped like them) to the RFC 7946 GeoJSON the
 * map reads. Numbers are rounded to what a rider reads; nothing private leaves here.
 */
export type TrailRowForMap = Pick<TrailMapProperties, "id" | "name" | "lengthM" | "descentM" | "maxGradePct"> & {
  /** Checked against the trail schemas when the trail was written. */
  difficulty: string;
  kind: string;
  direction: string;
  simplified: LineString | MultiLineString;
};
type Properties = TrailMapProperties;
export type TodayReport = { status: ReportedStatus; surfaces: string[] };

const round = (x: number | null, decimals = 0) => (x === null ? null : Math.round(x * 10 ** decimals) / 10 ** decimals);

export function trailMapProperties(trail: Omit<TrailRowForMap, "simplified">, today: TodayReport | undefined, lastReportAt: Date | null): TrailMapProperties {
  return {
    id: trail.id,
    name: trail.name,
    difficulty: trail.difficulty as Properties["difficulty"],
    kind: trail.kind as Properties["kind"],
    direction: trail.direction as Properties["direction"],
    lengthM: round(trail.lengthM)!,
    descentM: round(trail.descentM),
    maxGradePct: round(trail.maxGradePct, 1),
    status: today?.status ?? null,
    statusLabel: statusLabel(today?.status),
    surfaces: today?.surfaces ?? [],
    lastReportAt: lastReportAt ? lastReportAt.toISOString() : null,
  };
}

export function trailsCollection(
  trails: TrailRowForMap[],
  todayByTrail: Map<string, TodayReport>,
  lastReportByTrail: Map<string, Date>,
): FeatureCollection<LineString | MultiLineString, TrailMapProperties> {
  return {
    type: "FeatureCollection",
    features: trails.map(({ simplified, ...trail }) => ({
      type: "Feature",
      properties: trailMapProperties(trail, todayByTrail.get(trail.id), lastReportByTrail.get(trail.id) ?? null),
      geometry: simplified,
    })),
  };
}

export const humanize = (kind: string) => kind.replace(/[-_]+/g, " ");

export type HazardRowForMap = { id: string; trailId: string | null; kind: string; note: string | null; lon: number; lat: number; reportedAt: Date };
export type HazardMapProperties = { id: string; trailId: string | null; kind: string; kindLabel: string; note: string | null; reportedAt: string };

export function hazardsCollection(hazards: HazardRowForMap[]): FeatureCollection<Point, HazardMapProperties> {
  return {
    type: "FeatureCollection",
    features: hazards.map((h) => ({
      type: "Feature",
      properties: { id: h.id, trailId: h.trailId, kind: h.kind, kindLabel: humanize(h.kind), note: h.note, reportedAt: h.reportedAt.toISOString() },
      geometry: { type: "Point", coordinates: [h.lon, h.lat] },
    })),
  };
}

export type TrailFeatureRowForMap = { id: string; trailId: string; kind: string; name: string | null; size: string | null; lon: number; lat: number; distanceAlongM: number };
export type FeatureMapProperties = { id: string; trailId: string; trailName: string | null; featureKind: string; name: string | null; size: string | null; label: string; distanceAlongM: number };

export function trailFeaturesCollection(features: TrailFeatureRowForMap[], trailNames: Map<string, string>): FeatureCollection<Point, FeatureMapProperties> {
  return {
    type: "FeatureCollection",
    features: features.map((f): Feature<Point, FeatureMapProperties> => ({
      type: "Feature",
      properties: {
        id: f.id,
        trailId: f.trailId,
        trailName: trailNames.get(f.trailId) ?? null,
        featureKind: f.kind,
        name: f.name,
        size: f.size,
        label: f.name ? `${humanize(f.kind)}: ${f.name}` : humanize(f.kind),
        distanceAlongM: round(f.distanceAlongM)!,
      },
      geometry: { type: "Point", coordinates: [f.lon, f.lat] },
    })),
  };
}
