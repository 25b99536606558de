"use client";

import { useCallback, useEffect, useState, useSyncExternalStore } from "react";
import { onQueueChange, queuedWrites, type QueuedWrite } from "./outbox";
import { keptRigs, type KeptRig } from "./kept-rigs";

function subscribeOnline(listener: () => void) {
  window.addEventListener("online", listener);
  window.addEventListener("offline", listener);
  return () => {
    window.removeEventListener("online", listener);
    window.removeEventListener("offline", listener);
  };
}

/** Whether the browser believes it has a connection (true while rendering on the server). */
export const useOnline = () =>
  useSyncExternalStore(
    subscribeOnline,
    () => navigator.onLine,
    () => true,
  );

type Kept<T> = { items: T[] | null; problem: string | null };

function useKept<T>(read: () => Promise<T[]>): Kept<T> {
  const [state, setState] = useState<Kept<T>>({ items: null, problem: null });
  const refresh = useCallback(
    () =>
      read().then(
        (items) => setState({ items, problem: null }),
        (error: Error) => setState({ items: [], problem: error.message }),
      ),
    [read],
  );
  useEffect(() => {
    void refresh();
    return onQueueChange(() => void refresh());
  }, [refresh]);
  return state;
}

/** The writes queued on this phone (waiting or refused), kept up to date as they are sent. */
export const useQueuedWrites = () => useKept<QueuedWrite>(queuedWrites);

/** The rigs kept on this phone for offline reading. */
export const useKeptRigs = () => useKept<KeptRig>(keptRigs);
