"use client";
import dynamic from "next/dynamic";
import type { PickPointProps } from "./pick-point-canvas";

/**
 * A map for choosing one point (e.g. where a hazard is), for forms: `onChange(lon, lat)` fires on
 * every tap, drag or arrow-key nudge. MapLibre loads only when this is shown.
 */
const PickPointCanvas = dynamic(() => import("./pick-point-canvas"), {
  ssr: false,
  loading: () => <div className="flex h-[60vh] min-h-80 items-center justify-center rounded-xl border border-loam-300 bg-loam-100">Loading the map…</div>,
});

export function PickPointMap(props: PickPointProps) {
  return <PickPointCanvas {...props} />;
}
