"use client";
import dynamic from "next/dynamic";
import type { StaffPinMapProps } from "./staff-pin-map";

const StaffPinMap = dynamic(() => import("./staff-pin-map"), {
  ssr: false,
  loading: () => <div className="flex h-[60vh] min-h-80 items-center justify-center rounded-xl border border-loam-300 bg-loam-100">Loading the map…</div>,
});

export function StaffPinMapLoader(props: StaffPinMapProps) {
  return <StaffPinMap {...props} />;
}
