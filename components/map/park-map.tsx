"use client";
import { useCallback, useMemo, useRef, useState } from "react";
import Map, { GeolocateControl, NavigationControl, type MapLayerMouseEvent, type MapRef } from "react-map-gl/maplibre";
import type { Bounds } from "@/lib/map/pure/bounds";
import type { HazardMapProperties } from "@/lib/map/pure/geojson";
import { LAYER_IDS, SOURCE_IDS } from "@/lib/map/pure/layer-ids";
import { nearestTrail } from "@/lib/map/pure/nearest-trail";
import type { TrailMapProperties } from "@/lib/map/pure/schemas";
import { LayerToggles } from "./layer-toggles";
import { baseMapProps, exposeMapForTests } from "./maplibre-setup";
import { HazardCard, TrailCard } from "./trail-card";
import { useMapState } from "./use-map-state";

export type ParkMapProps = {
  styleUrl: string;
  bounds: Bounds;
  timeZone: string;
  trails: TrailMapProperties[];
  hazards: HazardMapProperties[];
};

type Selection = { kind: "trail"; id: string } | { kind: "hazard"; id: string } | null;
const INTERACTIVE = [LAYER_IDS.trailHit, LAYER_IDS.hazards];

/** The rider's park map: tap a trail or a hazard for its card; toggles, zoom and locate-me controls. */
export default function ParkMap({ styleUrl, bounds, timeZone, trails, hazards }: ParkMapProps) {
  const mapRef = useRef<MapRef>(null);
  const { state, onIdle, onError } = useMapState();
  const [selection, setSelection] = useState<Selection>(null);
  const [cursor, setCursor] = useState<string>("");
  const trailsById = useMemo(() => new globalThis.Map(trails.map((t) => [t.id, t])), [trails]);
  const hazardsById = useMemo(() => new globalThis.Map(hazards.map((h) => [h.id, h])), [hazards]);

  const select = useCallback((next: Selection) => {
    const map = mapRef.current?.getMap();
    setSelection((previous) => {
      if (map && previous?.kind === "trail") map.setFeatureState({ source: SOURCE_IDS.trails, id: previous.id }, { selected: false });
      if (map && next?.kind === "trail") map.setFeatureState({ source: SOURCE_IDS.trails, id: next.id }, { selected: true });
      return next;
    });
  }, []);

  const onClick = useCallback(
    (event: MapLayerMouseEvent) => {
      // Hazards sit on top of trails: a tap on a pin opens the pin.
      const pin = event.features?.find((f) => f.layer.id === LAYER_IDS.hazards)?.properties?.id as string | undefined;
      if (pin) return select({ kind: "hazard", id: pin });
      // Of the trails inside the generous hit area, the one nearest the finger.
      const lines = (event.features ?? []).filter((f) => f.layer.id === LAYER_IDS.trailHit && typeof f.properties?.id === "string");
      const id = nearestTrail(event.lngLat.lng, event.lngLat.lat, lines.map((f) => ({ id: f.properties.id as string, geometry: f.geometry })));
      select(id ? { kind: "trail", id } : null);
    },
    [select],
  );

  const trail = selection?.kind === "trail" ? trailsById.get(selection.id) : undefined;
  const hazard = selection?.kind === "hazard" ? hazardsById.get(selection.id) : undefined;

  return (
    <div className="space-y-2">
      <div className="relative h-[62vh] min-h-80 overflow-hidden rounded-xl border border-loam-300" data-testid="park-map" data-map-state={state}>
        <Map
          ref={mapRef}
          {...baseMapProps(styleUrl, bounds)}
          interactiveLayerIds={INTERACTIVE}
          cursor={cursor}
          onMouseEnter={() => setCursor("pointer")}
          onMouseLeave={() => setCursor("")}
          onClick={onClick}
          onLoad={(event) => exposeMapForTests(event.target)}
          onIdle={onIdle}
          onError={onError}
        >
          <NavigationControl position="top-right" showCompass={false} />
          <GeolocateControl position="top-right" trackUserLocation showAccuracyCircle />
        </Map>
        {trail && <TrailCard trail={trail} timeZone={timeZone} onClose={() => select(null)} />}
        {hazard && <HazardCard hazard={hazard} trailName={hazard.trailId ? (trailsById.get(hazard.trailId)?.name ?? null) : null} timeZone={timeZone} onClose={() => select(null)} />}
      </div>
      <LayerToggles mapRef={mapRef} />
    </div>
  );
}
