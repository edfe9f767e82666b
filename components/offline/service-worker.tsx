"use client";
/**
 * Registers the service worker on a park's pages and caches each page the rider opens, so the
 * board and map read offline. Back online, the page reloads to show the current board.
 */
import { SerwistProvider } from "@serwist/turbopack/react";

export function ServiceWorker({ children }: { children: React.ReactNode }) {
  return (
    <SerwistProvider swUrl="/serwist/sw.js" disable={process.env.NODE_ENV === "development"} reloadOnOnline cacheOnNavigation>
      {children}
    </SerwistProvider>
  );
}
