"use client";

import { SerwistProvider } from "@serwist/turbopack/react";
import { messageSW } from "@serwist/window";
import type { ReactNode } from "react";
import { SERVICE_WORKER_URL } from "@/lib/offline/urls";

// The development server rebuilds pages on every request: a service worker there would only serve stale
// ones, so it is registered in the production build alone.
const enabled = process.env.NODE_ENV === "production";

/** Registers the service worker for the whole site. Pages are kept as they are opened; nothing reloads by itself when the signal returns. */
export function OfflineSupport({ children }: { children: ReactNode }) {
  return (
    <SerwistProvider swUrl={SERVICE_WORKER_URL} disable={!enabled} reloadOnOnline={false} cacheOnNavigation={false}>
      {children}
    </SerwistProvider>
  );
}

/** True when a service worker keeps pages on this phone (production build, a browser that has them). */
export const canKeepPages = () => enabled && typeof window !== "undefined" && "serviceWorker" in navigator && Boolean(window.serwist);

// The service worker answers only once every address is kept; with no signal it never answers.
const KEEP_TIMEOUT_MS = 60_000;

/** Asks the service worker to fetch and keep these addresses now; resolves once they are kept, rejects when that does not happen in time. */
export async function keepAddresses(urls: string[]): Promise<void> {
  let timer: number | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = window.setTimeout(() => reject(new Error("its pages could not be fetched now (no connection?).")), KEEP_TIMEOUT_MS);
  });
  try {
    // To the active worker itself: the registration helper's own channel waits for a worker it installed, which a page opened later never sees.
    const worker = navigator.serviceWorker.ready.then((registration) => registration.active!);
    await Promise.race([worker.then((active) => messageSW(active, { type: "CACHE_URLS", payload: { urlsToCache: urls } })), timeout]);
  } finally {
    window.clearTimeout(timer);
  }
}
