"use client";

import { useCallback, useEffect, useRef, useState, useSyncExternalStore } from "react";
import { useQueryClient, type QueryKey } from "@tanstack/react-query";
import { onQueueChange, queuedWrites, serverReachable, type QueuedWrite } from "./outbox";
import { keptRigs, type KeptRig } from "./kept-rigs";

function subscribeOnline(listener: () => void) {
  window.addEventListener("online", listener);
  window.addEventListener("offline", listener);
  const stopQueue = onQueueChange(listener);
  return () => {
    window.removeEventListener("online", listener);
    window.removeEventListener("offline", listener);
    stopQueue();
  };
}

/** Whether there is a connection: the browser says so and the last write reached the server (true while rendering on the server). */
export const useOnline = () =>
  useSyncExternalStore(
    subscribeOnline,
    () => navigator.onLine && serverReachable(),
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

/** Reads the server's record again once the writes shown as waiting on it have all been sent. */
export function useRefetchWhenSent(waitingCount: number, queryKey: QueryKey) {
  const client = useQueryClient();
  const before = useRef(waitingCount);
  useEffect(() => {
    if (before.current > 0 && waitingCount === 0) void client.invalidateQueries({ queryKey });
    before.current = waitingCount;
  }, [waitingCount, client, queryKey]);
}
