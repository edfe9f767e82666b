"use client";
/** "As of 06:42, you are offline": shown while the browser is offline, in park time. */
import { useSyncExternalStore } from "react";
import { parkLocalTime } from "@/lib/shared/park-clock";

const subscribe = (onChange: () => void) => {
  window.addEventListener("online", onChange);
  window.addEventListener("offline", onChange);
  return () => {
    window.removeEventListener("online", onChange);
    window.removeEventListener("offline", onChange);
  };
};

export function useOnline(): boolean {
  return useSyncExternalStore(subscribe, () => navigator.onLine, () => true);
}

export function OfflineNote({ asOf, timeZone }: { asOf: string; timeZone: string }) {
  const online = useOnline();
  if (online) return null;
  return (
    <p role="status" className="rounded-lg border-2 border-dashed border-flare-500 bg-flare-100 p-3 font-semibold" data-testid="offline-note">
      As of {parkLocalTime(new Date(asOf), timeZone)}, you are offline. This is the last copy this phone saw; it refreshes when you are back online.
    </p>
  );
}
