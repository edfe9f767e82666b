"use client";
import { useState, type RefObject } from "react";
import type { MapRef } from "react-map-gl/maplibre";
import { TOGGLE_GROUPS, type ToggleGroup } from "@/lib/map/pure/layer-ids";

/** Switch groups of map layers off and on (features, hazards, contours). */
export function LayerToggles({ mapRef }: { mapRef: RefObject<MapRef | null> }) {
  const [shown, setShown] = useState<Record<ToggleGroup, boolean>>({ features: true, hazards: true, contours: true });

  function toggle(group: ToggleGroup, visible: boolean) {
    setShown((s) => ({ ...s, [group]: visible }));
    const map = mapRef.current?.getMap();
    if (!map) return;
    for (const id of TOGGLE_GROUPS[group].layers) if (map.getLayer(id)) map.setLayoutProperty(id, "visibility", visible ? "visible" : "none");
  }

  return (
    <fieldset className="flex flex-wrap gap-x-4 gap-y-1 text-sm" data-testid="layer-toggles">
      <legend className="sr-only">Show on the map</legend>
      {(Object.keys(TOGGLE_GROUPS) as ToggleGroup[]).map((group) => (
        <label key={group} className="inline-flex min-h-tap items-center gap-2">
          <input type="checkbox" className="h-5 w-5 accent-moss-600" checked={shown[group]} onChange={(e) => toggle(group, e.target.checked)} />
          {TOGGLE_GROUPS[group].label}
        </label>
      ))}
    </fieldset>
  );
}
