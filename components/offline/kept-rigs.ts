import { KEPT_CACHES } from "@/lib/offline/urls";
import { readAll, removeAll, write } from "./storage";

// The rigs this phone keeps for offline reading, and when each was last fetched while online.

export interface KeptRig {
  rigId: string;
  name: string;
  /** "Revision 3, signed off" as the rig's page said it when it was kept. */
  revisionText: string;
  siteName: string | null;
  signedOffNumber: number | null;
  /** When its pages and data were last fetched from the crew's server. */
  syncedAt: string;
}

export async function keptRigs(): Promise<KeptRig[]> {
  return (await readAll<KeptRig>("kept-rigs")).sort((a, b) => b.syncedAt.localeCompare(a.syncedAt));
}

export const keepRig = (rig: KeptRig) => write("kept-rigs", rig.rigId, rig);

/**
 * Forgets everything this phone keeps for the signed-in member: the kept pages and data, the list of
 * kept rigs and the queue (the caller has asked about waiting writes first). Used on sign-out, so the
 * next person to sign in on this phone reads nothing of the last one's crew.
 */
export async function forgetThisPhone(): Promise<void> {
  if (typeof caches !== "undefined") await Promise.all(Object.values(KEPT_CACHES).map((name) => caches.delete(name)));
  await Promise.allSettled([removeAll("kept-rigs"), removeAll("queued-writes")]);
}
