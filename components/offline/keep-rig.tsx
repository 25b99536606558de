"use client";

import Link from "next/link";
import { useEffect, useState } from "react";
import { OFFLINE_PAGE, rigOfflineUrls } from "@/lib/offline/urls";
import { when } from "@/lib/when";
import { canKeepPages, keepAddresses } from "./service-worker";
import { keepRig, keptRigs, type KeptRig } from "./kept-rigs";
import { useOnline } from "./use-offline";

interface KeepRigProps {
  rig: Omit<KeptRig, "syncedAt">;
  revisionId: string;
  signedOffRevisionId: string | null;
}

// The copy this phone holds (when it was synced, if ever) and whether a sync is under way or just failed.
type Keeping = { keptAt: string | null; syncing: boolean; failure: string | null };

/**
 * Keeps an opened rig on this phone for the site: its page, its card (print page and PDF), its checklist
 * runs and readings, fetched now while there is a connection. Without one, says when the copy shown was made.
 */
export function KeepRig({ rig, revisionId, signedOffRevisionId }: KeepRigProps) {
  const online = useOnline();
  const [keeping, setKeeping] = useState<Keeping>({ keptAt: null, syncing: false, failure: null });
  const { rigId, name, revisionText, siteName, signedOffNumber } = rig;

  useEffect(() => {
    let current = true;
    const settle = (next: Partial<Keeping>) => current && setKeeping((was) => ({ ...was, ...next }));
    keptRigs().then(
      (kept) => settle({ keptAt: kept.find((k) => k.rigId === rigId)?.syncedAt ?? null }),
      (error: Error) => settle({ failure: error.message }),
    );
    if (online && canKeepPages()) {
      settle({ syncing: true, failure: null });
      keepAddresses(rigOfflineUrls(rigId, revisionId, signedOffRevisionId))
        .then(async () => {
          const syncedAt = new Date().toISOString();
          await keepRig({ rigId, name, revisionText, siteName, signedOffNumber, syncedAt });
          settle({ keptAt: syncedAt, syncing: false });
        })
        .catch((error: Error) => settle({ syncing: false, failure: error.message }));
    }
    return () => {
      current = false;
    };
  }, [online, rigId, name, revisionText, siteName, signedOffNumber, revisionId, signedOffRevisionId]);

  const copy = keeping.keptAt ? `last synced ${when(keeping.keptAt)}` : null;
  const text = keeping.syncing
    ? `Keeping this rig on this phone for offline use…${copy ? ` (the copy shown was ${copy})` : ""}`
    : keeping.failure
      ? `Not synced now: ${keeping.failure}${copy ? ` The copy on this phone was ${copy}.` : ""}`
      : online
        ? copy && `Kept on this phone for offline use, ${copy}.`
        : `Offline: this is the copy kept on this phone${copy ? `, ${copy}` : ""}. Ticks and readings made now wait and are sent when the signal returns.`;
  if (!text) return null;
  return (
    <p className="text-sm text-ink-600" data-testid="offline-keeping">
      {text} <Link href={OFFLINE_PAGE}>What works offline</Link>
    </p>
  );
}
