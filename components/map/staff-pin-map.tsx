"use client";
import { useRef, useState } from "react";
import type { Bounds } from "@/lib/map/pure/bounds";
import { PIN_DRAWN_LAYERS } from "@/lib/map/pure/layer-ids";
import { applyMoveAnswer, moveRequest, sendMove, undoRequest, type Pin, type PinMoveResult } from "@/lib/map/pure/pin-moves";
import PinMapCanvas from "./pin-map-canvas";

export type StaffPinMapProps = { styleUrl: string; bounds: Bounds; pins: Pin[] };

/** Keyboard nudges wait this long for the next press before saving. */
const KEY_SAVE_DELAY_MS = 700;

/**
 * Staff move trail features and hazard pins: drag a pin, or select it and tap the map, or use
 * the arrow keys. Each move is saved at once (features snap onto their trail) and the last one
 * can be undone.
 */
export default function StaffPinMap({ styleUrl, bounds, pins: initial }: StaffPinMapProps) {
  const [pins, setPins] = useState(initial);
  const [selected, setSelected] = useState<string | null>(null);
  const [last, setLast] = useState<PinMoveResult | null>(null);
  const [message, setMessage] = useState<{ text: string; error?: boolean } | null>(null);
  const [busy, setBusy] = useState(false);
  const keyTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);

  const replacePin = (pin: Pin) => setPins((all) => all.map((p) => (p.key === pin.key ? pin : p)));

  async function save(pin: Pin, to: { lon: number; lat: number }, undo = false) {
    setBusy(true);
    try {
      const result = applyMoveAnswer(pin, await sendMove(undo && last ? undoRequest(last) : moveRequest(pin, to)));
      replacePin(result.pin);
      setLast(undo ? null : result);
      setMessage({ text: undo ? `Moved ${pin.label} back.` : `Saved the new position of ${pin.label}${pin.kind === "feature" ? " (snapped onto its trail)" : ""}.` });
    } catch (error) {
      replacePin(pins.find((p) => p.key === pin.key) ?? pin);
      setMessage({ text: (error as Error).message, error: true });
    } finally {
      setBusy(false);
    }
  }

  function onMove(key: string, lon: number, lat: number, how: "drag" | "tap" | "key") {
    const pin = pins.find((p) => p.key === key);
    if (!pin || busy) return;
    if (how !== "key") return void save(pin, { lon, lat });
    // Show each nudge at once; save when the presses stop.
    replacePin({ ...pin, lon, lat });
    clearTimeout(keyTimer.current);
    keyTimer.current = setTimeout(() => void save(pin, { lon, lat }), KEY_SAVE_DELAY_MS);
  }

  const selectedPin = pins.find((p) => p.key === selected);
  return (
    <div className="space-y-3">
      <PinMapCanvas
        styleUrl={styleUrl}
        bounds={bounds}
        pins={pins.map((p) => ({ key: p.key, lon: p.lon, lat: p.lat, label: p.label, look: p.kind }))}
        selectedKey={selected}
        hideLayers={PIN_DRAWN_LAYERS}
        onSelect={(key) => setSelected((s) => (s === key ? null : key))}
        onMove={onMove}
        label="Trail features and hazard pins"
      />
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" className="btn-quiet" disabled={!last || busy} onClick={() => last && void save(last.pin, last.previous, true)}>
          Undo last move
        </button>
        <p className="text-sm" aria-live="polite" data-testid="pin-status">
          {message ? <span className={message.error ? "field-error" : ""}>{message.text}</span> : selectedPin ? `Selected: ${selectedPin.label}. Tap the map where it belongs, or drag it.` : "Drag a pin, or tap one and then tap the map where it belongs."}
        </p>
      </div>
    </div>
  );
}
