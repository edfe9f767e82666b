"use client";
import { useCallback, useState } from "react";

export type MapState = "loading" | "idle" | "error";

/** Tracks whether the map has finished drawing, for the container's data-map-state attribute. */
export function useMapState() {
  const [state, setState] = useState<MapState>("loading");
  const onIdle = useCallback(() => setState("idle"), []);
  const onError = useCallback((event: { error?: Error }) => {
    console.error("[map]", event.error?.message ?? event);
    setState("error");
  }, []);
  return { state, onIdle, onError };
}
