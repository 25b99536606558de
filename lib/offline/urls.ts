// Addresses the service worker and the pages agree on.

/** The page shown for any address not kept on this phone while offline. */
export const OFFLINE_PAGE = "/offline";

/** Where the built service worker is served, and the scope it is given. */
export const SERVICE_WORKER_URL = "/serwist/sw.js";

/** Caches that hold what a member opened (cleared on sign-out, with everything else this phone keeps). */
export const KEPT_CACHES = { pages: "rig-pages", data: "rig-data" } as const;

/** Pages kept for reading offline: the rigs list, each rig, its card and review page. */
export const isKeptPage = (pathname: string) => pathname === "/rigs" || pathname.startsWith("/rigs/");

/** Data kept for reading offline: what the rig pages fetch (revisions, checklist runs, readings, the card as PDF). */
export const isKeptData = (pathname: string) => pathname === "/api/rigs" || pathname.startsWith("/api/rigs/");

/** Everything a signed-off rig's page needs offline, fetched while online so it is kept before the crew leaves signal. */
export function rigOfflineUrls(rigId: string, revisionId: string, signedOffRevisionId: string | null): string[] {
  const urls = [`/rigs/${rigId}`, `/rigs/${rigId}/card?revision=${revisionId}`, `/api/rigs/${rigId}/revisions`];
  if (signedOffRevisionId) {
    const base = `/api/rigs/${rigId}/revisions/${signedOffRevisionId}`;
    urls.push(`/rigs/${rigId}/card?revision=${signedOffRevisionId}`, `${base}/card`, `${base}/checklists`, `${base}/readings`);
  }
  return [...new Set(urls)];
}
