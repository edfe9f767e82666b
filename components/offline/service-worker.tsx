"use client";
/**
 * Registers the service worker on a park's pages and caches each page the rider opens, so the
 * board and map read offline. Back online, the page reloads to show the current board.
 */
import { SerwistProvider } from "@serwist/turbopack/react";
import { useEffect } from "react";

/** The page that registered the worker loaded before the worker ran: ask it to keep this page too. */
function useCacheThisPage() {
  useEffect(() => {
    if (!("serviceWorker" in navigator) || !navigator.onLine) return;
    void navigator.serviceWorker.ready.then((registration) =>
      registration.active?.postMessage({ type: "CACHE_URLS", payload: { urlsToCache: [location.pathname] } }),
    );
  }, []);
}

export function ServiceWorker({ children }: { children: React.ReactNode }) {
  useCacheThisPage();
  return (
    <SerwistProvider swUrl="/serwist/sw.js" disable={process.env.NODE_ENV === "development"} reloadOnOnline cacheOnNavigation>
      {children}
    </SerwistProvider>
  );
}
