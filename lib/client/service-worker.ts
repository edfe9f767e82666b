/// <reference lib="webworker" />
/**
 * The service worker (Serwist), bundled by app/serwist/[path]/route.ts. It keeps what a rider
 * needs at breakfast with one bar of signal: the app shell (precached build files), the boards and
 * maps of the parks they opened, and each map's style, GeoJSON and worker. Everything it serves
 * from a cache is a GET a rider could read anyway; it never touches staff or account pages, and
 * never queues a write (POSTs go to the network, and fail visibly offline). It also shows the
 * push alerts of the parks a rider asked for (push, notificationclick).
 */
import { CacheFirst, ExpirationPlugin, NetworkFirst, Serwist, type PrecacheEntry, type SerwistGlobalConfig } from "serwist";
import { readPushAlert, sameOriginUrl } from "@/lib/notices/pure/push-alert";

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}
declare const self: ServiceWorkerGlobalScope;

/** A park's board and map pages (HTML, not the RSC payloads of client navigations). */
const PARK_PAGE = /^\/parks\/[^/]+(\/map)?\/?$/;
/** The data those pages read: the board, the map style and its GeoJSON sources. */
const PARK_DATA = /^\/api\/parks\/[^/]+\/(board|map-style\.json|[a-z-]+\.geojson)$/;
/** Files that never change under the same name (build files carry a content hash). */
const FIXED_FILES = /^\/(_next\/static|vendor|map\/fonts|icons)\//;

const days = (n: number) => n * 86_400;

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: [
    {
      matcher: ({ url, request, sameOrigin }) => sameOrigin && PARK_PAGE.test(url.pathname) && !request.headers.has("RSC"),
      // Online, always the network (never a stale board); offline or after 4 s, the last copy.
      handler: new NetworkFirst({ cacheName: "park-pages", networkTimeoutSeconds: 4, plugins: [new ExpirationPlugin({ maxEntries: 24, maxAgeSeconds: days(14) })] }),
    },
    {
      matcher: ({ url, sameOrigin }) => sameOrigin && PARK_DATA.test(url.pathname),
      handler: new NetworkFirst({ cacheName: "park-data", networkTimeoutSeconds: 4, plugins: [new ExpirationPlugin({ maxEntries: 120, maxAgeSeconds: days(14) })] }),
    },
    {
      matcher: ({ url, sameOrigin }) => sameOrigin && FIXED_FILES.test(url.pathname),
      handler: new CacheFirst({ cacheName: "fixed-files", plugins: [new ExpirationPlugin({ maxEntries: 200, maxAgeSeconds: days(60) })] }),
    },
  ],
});

serwist.addEventListeners();

// A push must always show a notification (browsers require it of userVisibleOnly subscriptions).
self.addEventListener("push", (event) => {
  const alert = readPushAlert(event.data?.text(), self.location.origin);
  event.waitUntil(
    self.registration.showNotification(alert.title, { body: alert.body, tag: alert.tag, data: { url: alert.url }, icon: "/icons/icon-192.png", badge: "/icons/icon-192.png" }),
  );
});

// A tap opens the park's board: an open tab of it is focused rather than a second one opened.
self.addEventListener("notificationclick", (event) => {
  event.notification.close();
  const url = sameOriginUrl(event.notification.data?.url, self.location.origin);
  event.waitUntil(
    (async () => {
      const windows = await self.clients.matchAll({ type: "window", includeUncontrolled: true });
      const open = windows.find((w) => w.url === url);
      if (open) return open.focus();
      return self.clients.openWindow(url);
    })(),
  );
});
