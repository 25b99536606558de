import { clear, createStore, del, get, set, values, type UseStore } from "idb-keyval";

// What this phone keeps for offline use, in IndexedDB: one database a kind of record, so each can be
// read whole and cleared on its own.

// "probe" only ever holds the one record that checks the storage works.
export type KeptKind = "queued-writes" | "kept-rigs" | "probe";

/** IndexedDB is missing, refused or full: said in words a member can act on. */
export class StorageUnavailable extends Error {}

const stores = new Map<KeptKind, UseStore>();

function storeOf(kind: KeptKind): UseStore {
  if (typeof indexedDB === "undefined") {
    throw new StorageUnavailable("This browser keeps no data for offline use (a private window, or site storage turned off). Everything still works online.");
  }
  let store = stores.get(kind);
  if (!store) {
    store = createStore(`spanwright-${kind}`, kind);
    stores.set(kind, store);
  }
  return store;
}

async function guarded<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof StorageUnavailable) throw error;
    const name = (error as { name?: string } | null)?.name;
    if (name === "QuotaExceededError") {
      throw new StorageUnavailable("This phone's storage is full: nothing more can be kept for offline use. Free some space; everything still works online.");
    }
    throw new StorageUnavailable("This phone's storage could not be used for offline keeping. Everything still works online.");
  }
}

export const readAll = <T>(kind: KeptKind) => guarded(() => values<T>(storeOf(kind)));
export const readOne = <T>(kind: KeptKind, key: string) => guarded(() => get<T>(key, storeOf(kind)));
export const write = (kind: KeptKind, key: string, value: unknown) => guarded(() => set(key, value, storeOf(kind)));
export const remove = (kind: KeptKind, key: string) => guarded(() => del(key, storeOf(kind)));
export const removeAll = (kind: KeptKind) => guarded(() => clear(storeOf(kind)));

/** Null when this phone can keep data for offline use, else why not. */
export async function storageProblem(): Promise<string | null> {
  try {
    await write("probe", "probe", { at: Date.now() });
    await remove("probe", "probe");
    return null;
  } catch (error) {
    return (error as Error).message;
  }
}
