"use client";
import dynamic from "next/dynamic";
import type { ParkMapProps } from "./park-map";

// MapLibre is large: it loads only here, in the browser, after the page (and its trail list) has shown.
const ParkMap = dynamic(() => import("./park-map"), {
  ssr: false,
  loading: () => (
    <div className="flex h-[62vh] min-h-80 items-center justify-center rounded-xl border border-loam-300 bg-loam-100 p-4 text-center text-loam-700" data-map-state="loading">
      Loading the map… Every trail and its status is also listed below.
    </div>
  ),
});

export function ParkMapLoader(props: ParkMapProps) {
  return <ParkMap {...props} />;
}
