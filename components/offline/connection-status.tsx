"use client";

import Link from "next/link";
import { useEffect, useState } from "react";
import { classNames } from "@/lib/class-names";
import { OFFLINE_PAGE } from "@/lib/offline/urls";
import { sendQueued } from "./outbox";
import { useOnline, useQueuedWrites } from "./use-offline";

// While writes wait and the browser says it is online, try again this often (a weak signal comes and goes).
const RETRY_MS = 20_000;

/** Online or not, and the writes this phone still has to send or that the server refused; sends them when the signal returns. */
export function ConnectionStatus() {
  const online = useOnline();
  const { items, problem } = useQueuedWrites();
  const [stoppedBecause, setStoppedBecause] = useState<string | null>(null);
  const waiting = items?.filter((w) => !w.refusal).length ?? 0;
  const refused = items?.filter((w) => w.refusal).length ?? 0;

  useEffect(() => {
    if (waiting === 0) return;
    // Tried even when the last try found no signal: that is how the indicator learns it is back.
    const send = () => navigator.onLine && void sendQueued().then((summary) => setStoppedBecause(summary.stoppedBecause));
    send();
    const timer = window.setInterval(send, RETRY_MS);
    return () => window.clearInterval(timer);
  }, [online, waiting]);

  const details = [
    waiting ? `${waiting} ${waiting === 1 ? "write" : "writes"} waiting to sync` : null,
    refused ? `${refused} refused by the server` : null,
  ].filter(Boolean);
  return (
    <div role="status" aria-live="polite" className="flex min-w-0 flex-wrap items-center gap-x-2 text-sm" data-testid="connection-status">
      <span className={classNames("inline-flex items-center gap-1 font-semibold", online ? "text-ok-700" : "text-caution-800")}>
        <span aria-hidden className={classNames("h-2.5 w-2.5 rounded-full", online ? "bg-ok-700" : "border-2 border-caution-800")} />
        {online ? "Online" : "Offline"}
      </span>
      {details.length ? (
        <Link href={OFFLINE_PAGE} className={classNames(refused ? "font-semibold text-danger-700" : "text-ink-700")}>
          {details.join(", ")}
        </Link>
      ) : null}
      {online && waiting && stoppedBecause ? <span className="text-ink-600">{stoppedBecause}</span> : null}
      {problem ? <span className="text-ink-600">Offline keeping is off: {problem}</span> : null}
    </div>
  );
}
