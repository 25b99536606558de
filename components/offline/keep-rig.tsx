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

type Keeping = { state: "idle" } | { state: "keeping" } | { state: "kept"; at: string } | { state: "failed"; why: string };

/**
 * Keeps an opened rig on this phone for the site: its page, its card (print page and PDF), its checklist
 * runs and readings, fetched now while there is a connection. Offline, says when the copy shown was made.
 */
export function KeepRig({ rig, revisionId, signedOffRevisionId }: KeepRigProps) {
  const online = useOnline();
  const [keeping, setKeeping] = useState<Keeping>({ state: "idle" });
  const { rigId, name, revisionText, siteName, signedOffNumber } = rig;

  useEffect(() => {
    let current = true;
    const settle = (next: Keeping) => current && setKeeping(next);
    if (!online) {
      keptRigs().then(
        (kept) => {
          const mine = kept.find((k) => k.rigId === rigId);
          settle(mine ? { state: "kept", at: mine.syncedAt } : { state: "idle" });
        },
        (error: Error) => settle({ state: "failed", why: error.message }),
      );
    } else if (canKeepPages()) {
      settle({ state: "keeping" });
      keepAddresses(rigOfflineUrls(rigId, revisionId, signedOffRevisionId))
        .then(async () => {
          const syncedAt = new Date().toISOString();
          await keepRig({ rigId, name, revisionText, siteName, signedOffNumber, syncedAt });
          settle({ state: "kept", at: syncedAt });
        })
        .catch((error: Error) => settle({ state: "failed", why: error.message }));
    }
    return () => {
      current = false;
    };
  }, [online, rigId, name, revisionText, siteName, signedOffNumber, revisionId, signedOffRevisionId]);

  const text =
    keeping.state === "keeping"
      ? "Keeping this rig on this phone for offline use…"
      : keeping.state === "kept"
        ? online
          ? `Kept on this phone for offline use, synced ${when(keeping.at)}.`
          : `Offline: this is the copy kept on this phone, last synced ${when(keeping.at)}. Writes made now wait and are sent when the signal returns.`
        : keeping.state === "failed"
          ? `Not kept for offline use: ${keeping.why}`
          : online
            ? null
            : "Offline: this page was kept by the browser, with no record of when it was synced.";
  if (!text) return null;
  return (
    <p className="text-sm text-ink-600" data-testid="offline-keeping">
      {text} <Link href={OFFLINE_PAGE}>What works offline</Link>
    </p>
  );
}
