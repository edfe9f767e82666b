"use client";
import { useState } from "react";
import { boundsAround, type Bounds } from "@/lib/map/pure/bounds";
import { parkDataUrls } from "@/lib/map/pure/sources";
import PinMapCanvas from "./pin-map-canvas";

export type PickPointProps = {
  parkSlug: string;
  initial?: { lon: number; lat: number } | null;
  /** Where the map opens when there is no point yet (defaults to around the initial point). */
  bounds?: Bounds;
  onChange: (lon: number, lat: number) => void;
  /** The point shown, when the form also sets it another way (typed, or the phone's location). */
  value?: { lon: number; lat: number } | null;
  label?: string;
};

/** Tap the map to place the point; drag it or use the arrow keys to adjust. */
export default function PickPointCanvas({ parkSlug, initial, bounds, onChange, value, label = "Tap the map to place the point" }: PickPointProps) {
  const [picked, setPoint] = useState(initial ?? null);
  const point = value !== undefined ? value : picked;
  const place = (lon: number, lat: number) => {
    setPoint({ lon, lat });
    onChange(lon, lat);
  };
  const opening = bounds ?? (initial ? boundsAround(initial.lon, initial.lat, 0.004) : undefined);
  if (!opening) throw new Error("PickPointMap needs an initial point or bounds to open on.");
  return (
    <PinMapCanvas
      styleUrl={parkDataUrls(parkSlug).style}
      bounds={opening}
      pins={point ? [{ key: "pick", lon: point.lon, lat: point.lat, label: "Chosen point", look: "pick" }] : []}
      selectedKey="pick"
      onMove={(_key, lon, lat) => place(lon, lat)}
      label={label}
    />
  );
}
