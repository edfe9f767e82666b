"use client";
import { useCallback, useEffect, useRef, useState, type KeyboardEvent } from "react";
import Map, { Marker, NavigationControl, type MapLayerMouseEvent, type MapRef, type MarkerDragEvent } from "react-map-gl/maplibre";
import { spreadOffsets } from "@/lib/map/pure/spread-pins";
import type { Bounds } from "@/lib/map/pure/bounds";
import { baseMapProps, exposeMapForTests } from "./maplibre-setup";
import { useMapState } from "./use-map-state";

export type CanvasPin = { key: string; lon: number; lat: number; label: string; look: "feature" | "hazard" | "pick" };

export type PinMapCanvasProps = {
  styleUrl: string;
  bounds: Bounds;
  pins: CanvasPin[];
  selectedKey: string | null;
  onSelect?: (key: string) => void;
  /** A pin was dragged, nudged with the arrow keys, or (when selected) sent where the map was tapped. */
  onMove: (key: string, lon: number, lat: number, how: "drag" | "tap" | "key") => void;
  label: string;
  /** Style layers that draw what the pins draw: hidden, so a moved pin is never drawn twice. */
  hideLayers?: readonly string[];
};

/** One arrow-key press moves a pin about this far. */
const NUDGE_M = 5;
const NUDGES: Record<string, [east: number, north: number]> = { ArrowUp: [0, 1], ArrowDown: [0, -1], ArrowLeft: [-1, 0], ArrowRight: [1, 0] };

const LOOKS = {
  feature: "h-5 w-5 border-2 border-loam-900 bg-white",
  hazard: "h-7 w-7 border-2 border-loam-900 bg-flare-400 font-bold text-loam-900",
  pick: "h-7 w-7 border-4 border-white bg-moss-600 shadow",
};

/** A map of draggable pins, shared by the staff pin page and the point picker. */
export default function PinMapCanvas({ styleUrl, bounds, pins, selectedKey, onSelect, onMove, label, hideLayers = [] }: PinMapCanvasProps) {
  const { state, onIdle, onError } = useMapState();
  const mapRef = useRef<MapRef>(null);
  // Pins that would overlap at this zoom are drawn apart, each its own 44 px target.
  const [offsets, setOffsets] = useState<Record<string, [number, number]>>({});
  const latestPins = useRef(pins);
  useEffect(() => {
    latestPins.current = pins;
  });
  const respread = useCallback(() => {
    const map = mapRef.current;
    if (!map) return;
    setOffsets(spreadOffsets(latestPins.current.map((pin) => ({ key: pin.key, ...map.project([pin.lon, pin.lat]) }))));
  }, []);
  // Callers pass a fresh array each render: spread again only when a pin really moved.
  const where = pins.map((pin) => `${pin.key}@${pin.lon},${pin.lat}`).join("|");
  useEffect(respread, [where, respread]);

  function onMapClick(event: MapLayerMouseEvent) {
    // A tap on a pin bubbles up to the map too: only a tap on the ground moves the selected pin.
    if ((event.originalEvent?.target as Element | null)?.closest?.(".maplibregl-marker")) return;
    if (selectedKey) onMove(selectedKey, event.lngLat.lng, event.lngLat.lat, "tap");
  }

  function onKey(event: KeyboardEvent, pin: CanvasPin) {
    const step = NUDGES[event.key];
    if (!step) return;
    event.preventDefault();
    const metresPerDegree = 111_195;
    const lat = pin.lat + (step[1] * NUDGE_M) / metresPerDegree;
    const lon = pin.lon + (step[0] * NUDGE_M) / (metresPerDegree * Math.cos((pin.lat * Math.PI) / 180));
    onMove(pin.key, lon, lat, "key");
  }

  return (
    <div className="relative h-[60vh] min-h-80 overflow-hidden rounded-xl border border-loam-300" data-testid="pin-map" data-map-state={state} aria-label={label} role="group">
      <Map
        ref={mapRef}
        {...baseMapProps(styleUrl, bounds)}
        onClick={onMapClick}
        onLoad={(event) => {
          for (const id of hideLayers) if (event.target.getLayer(id)) event.target.setLayoutProperty(id, "visibility", "none");
          exposeMapForTests(event.target);
          respread();
        }}
        onMoveEnd={respread}
        onIdle={onIdle}
        onError={onError}
      >
        <NavigationControl position="top-right" showCompass={false} />
        {pins.map((pin) => (
          <Marker
            key={pin.key}
            longitude={pin.lon}
            latitude={pin.lat}
            offset={offsets[pin.key] ?? [0, 0]}
            draggable
            onDragEnd={(event: MarkerDragEvent) => {
              // MapLibre moves the ground point under the pin's anchor; a spread pin is drawn off
              // its anchor, so where the finger let go is the anchor plus that offset.
              const [dx, dy] = offsets[pin.key] ?? [0, 0];
              const map = mapRef.current;
              const dropped = map ? map.unproject([map.project(event.lngLat).x + dx, map.project(event.lngLat).y + dy]) : event.lngLat;
              onMove(pin.key, dropped.lng, dropped.lat, "drag");
            }}
          >
            {/* The touch target is 44 × 44 px (WCAG 2.2, 2.5.5) whatever the size of the dot drawn inside it. */}
            <button
              type="button"
              className={`inline-flex h-11 w-11 items-center justify-center rounded-full ${selectedKey === pin.key ? "outline-4 -outline-offset-4 outline-moss-600" : ""}`}
              aria-label={`${pin.label}${selectedKey === pin.key ? " (selected: tap the map or use the arrow keys to move it)" : ""}`}
              aria-pressed={selectedKey === pin.key}
              title={pin.label}
              data-pin={pin.key}
              onClick={() => onSelect?.(pin.key)}
              onKeyDown={(event) => onKey(event, pin)}
            >
              <span aria-hidden="true" className={`inline-flex items-center justify-center rounded-full ${LOOKS[pin.look]}`}>
                {pin.look === "hazard" ? "!" : ""}
              </span>
            </button>
          </Marker>
        ))}
      </Map>
    </div>
  );
}
