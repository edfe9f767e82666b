"use client";
import { useCallback, useMemo, useRef, useState } from "react";
import Map, { GeolocateControl, NavigationControl, type MapLayerMouseEvent, type MapRef } from "react-map-gl/maplibre";
import type { Bounds } from "@/lib/map/pure/bounds";
import type { HazardMapProperties } from "@/lib/map/pure/geojson";
import { LAYER_IDS, SOURCE_IDS } from "@/lib/map/pure/layer-ids";
import type { TrailMapProperties } from "@/lib/map/pure/schemas";
import { LayerToggles } from "./layer-toggles";
import { exposeMapForTests, maplibregl } from "./maplibre-setup";
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
      const hit = event.features?.find((f) => f.layer.id === LAYER_IDS.hazards) ?? event.features?.[0];
      const id = hit?.properties?.id as string | undefined;
      if (!hit || !id) return select(null);
      select(hit.layer.id === LAYER_IDS.hazards ? { kind: "hazard", id } : { kind: "trail", id });
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
          mapLib={maplibregl}
          mapStyle={styleUrl}
          initialViewState={{ bounds, fitBoundsOptions: { padding: 28 } }}
          style={{ width: "100%", height: "100%" }}
          interactiveLayerIds={INTERACTIVE}
          cursor={cursor}
          onMouseEnter={() => setCursor("pointer")}
          onMouseLeave={() => setCursor("")}
          onClick={onClick}
          onLoad={(event) => exposeMapForTests(event.target)}
          onIdle={onIdle}
          onError={onError}
          dragRotate={false}
          pitchWithRotate={false}
          touchPitch={false}
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
