/// <reference lib="webworker" />
import { NetworkFirst, NetworkOnly, Serwist, type PrecacheEntry, type RouteMatchCallbackOptions, type SerwistPlugin } from "serwist";
import { KEPT_CACHES, OFFLINE_PAGE, isKeptData, isKeptPage } from "./urls";

declare const self: ServiceWorkerGlobalScope & { __SW_MANIFEST: (PrecacheEntry | string)[] | undefined };

// The service worker: the app's built files are precached when it installs; the rig pages and their data
// are fetched from the network whenever there is one and kept, so the last copy can be read with no signal.
// Writes are not its business: the pages keep those in IndexedDB and send them when the connection returns.

// A next-router request for a page's React payload: never kept, so an offline navigation falls back to
// loading the whole page, which is kept.
const isPayload = ({ request, url }: RouteMatchCallbackOptions) => request.headers.get("RSC") === "1" || url.searchParams.has("_rsc");

// Only a page the member was actually shown is kept: an answer that was redirected (to sign-in, say) or
// is not a plain 200 would show the wrong page offline under this rig's address.
const keepOnlyWhatWasAsked: SerwistPlugin = {
  cacheWillUpdate: async ({ response }) => (response.status === 200 && !response.redirected ? response : null),
};

const sameOriginGet = ({ request, url }: RouteMatchCallbackOptions) => request.method === "GET" && url.origin === self.location.origin;

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  runtimeCaching: [
    { matcher: (options) => sameOriginGet(options) && isPayload(options), handler: new NetworkOnly() },
    {
      matcher: (options) => sameOriginGet(options) && isKeptPage(options.url.pathname),
      handler: new NetworkFirst({ cacheName: KEPT_CACHES.pages, networkTimeoutSeconds: 10, plugins: [keepOnlyWhatWasAsked] }),
    },
    {
      matcher: (options) => sameOriginGet(options) && isKeptData(options.url.pathname),
      handler: new NetworkFirst({ cacheName: KEPT_CACHES.data, networkTimeoutSeconds: 10, plugins: [keepOnlyWhatWasAsked] }),
    },
    // Any other page goes to the network, so that with no signal the fallback below answers for it.
    { matcher: ({ request }) => request.mode === "navigate", handler: new NetworkOnly() },
  ],
  fallbacks: { entries: [{ url: OFFLINE_PAGE, matcher: ({ request }) => request.destination === "document" }] },
});

serwist.addEventListeners();
