"use client";
/**
 * Offline, a form is never sent and never queued for later: the submit is stopped before React
 * or the browser sees it, and the rider or ranger is told "offline, not sent".
 */
import { useEffect, useState } from "react";

export function OfflineWriteGuard() {
  const [refused, setRefused] = useState(false);
  useEffect(() => {
    const onSubmit = (event: Event) => {
      if (navigator.onLine) return;
      event.preventDefault();
      event.stopImmediatePropagation();
      setRefused(true);
    };
    const onOnline = () => setRefused(false);
    document.addEventListener("submit", onSubmit, true);
    window.addEventListener("online", onOnline);
    return () => {
      document.removeEventListener("submit", onSubmit, true);
      window.removeEventListener("online", onOnline);
    };
  }, []);
  if (!refused) return null;
  return (
    <p role="alert" className="fixed inset-x-2 bottom-2 z-50 mx-auto max-w-xl rounded-lg bg-brick-600 p-3 font-semibold text-white shadow-lg print:hidden" data-testid="offline-not-sent">
      Offline, not sent. Nothing was saved: send it again when you are back online.
    </p>
  );
}
