"use client";

import Link from "next/link";
import { useState } from "react";
import { PageHeader } from "@/components/page-header";
import { Panel } from "@/components/ui/panel";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/forms/form-error";
import { when } from "@/lib/when";
import { discardQueued, sendQueued } from "./outbox";
import { useKeptRigs, useOnline, useQueuedWrites } from "./use-offline";

/** What this phone keeps for the site: the rigs and when each was synced, the writes waiting or refused, and what needs a connection. */
export function OfflineOverview() {
  const online = useOnline();
  const rigs = useKeptRigs();
  const writes = useQueuedWrites();
  const [sendNote, setSendNote] = useState<string | null>(null);
  const waiting = writes.items?.filter((w) => !w.refusal) ?? [];
  const refused = writes.items?.filter((w) => w.refusal) ?? [];
  const problem = rigs.problem ?? writes.problem;

  return (
    <>
      <PageHeader
        title="Working offline"
        lead={
          online
            ? "This phone is online. Rigs you open are kept here so they can be read at a site with no signal."
            : "This phone has no connection. What is listed below still works; everything else waits for the signal."
        }
      />
      <div className="space-y-6">
        {problem ? (
          <p className="rounded-panel border-2 border-caution-500 bg-caution-100 p-3" role="alert">
            {problem}
          </p>
        ) : null}
        <Panel title="Rigs kept on this phone" id="kept-rigs">
          {rigs.items === null ? (
            <p className="text-ink-600">Reading this phone&apos;s storage…</p>
          ) : rigs.items.length ? (
            <ul className="divide-y divide-ink-100">
              {rigs.items.map((rig) => (
                <li key={rig.rigId} className="py-2">
                  <Link href={`/rigs/${rig.rigId}`} className="font-semibold">
                    {rig.name}
                  </Link>
                  <span className="block text-sm text-ink-600">
                    {rig.siteName ? `On ${rig.siteName} · ` : ""}
                    {rig.revisionText} · last synced {when(rig.syncedAt)}
                  </span>
                  {rig.signedOffNumber === null ? (
                    <span className="block text-sm text-ink-600">
                      No revision signed off when it was kept: there is no checklist or reading to take on site.
                    </span>
                  ) : null}
                </li>
              ))}
            </ul>
          ) : (
            <p>None yet. Open a rig while online and it is kept here, with its card, its checklist and its readings.</p>
          )}
          <p className="text-sm text-ink-600">
            A kept copy is the rig as it stood when it was synced: a newer revision may have been signed off since. Check with the crew lead before rigging from
            it, and follow local rules and trained, qualified practice.
          </p>
        </Panel>
        <Panel title="Writes waiting to sync" id="waiting-writes">
          {waiting.length ? (
            <>
              <ol className="list-decimal space-y-1 pl-6">
                {waiting.map((w) => (
                  <li key={w.key}>
                    {w.what} <span className="text-sm text-ink-600">({when(w.madeAt)})</span>
                  </li>
                ))}
              </ol>
              <p className="text-sm text-ink-600">They are sent in this order as soon as the phone is online; each lands once, however often it is sent.</p>
              {online ? (
                <Button
                  tone="secondary"
                  onClick={() => void sendQueued().then((s) => setSendNote(s.stoppedBecause ?? `${s.sent} sent${s.refused ? `, ${s.refused} refused` : ""}.`))}
                >
                  Send now
                </Button>
              ) : null}
              {sendNote ? <p className="text-sm">{sendNote}</p> : null}
            </>
          ) : (
            <p>Nothing waiting: every checklist tick and reading made on this phone has reached the crew.</p>
          )}
        </Panel>
        {refused.length ? (
          <Panel title="Refused by the server" id="refused-writes">
            <p>These were made offline and refused when they were sent. They did not reach the crew; read why, then discard each.</p>
            <ul className="space-y-3">
              {refused.map((w) => (
                <li key={w.key} className="rounded-panel border-2 border-danger-600 p-3" data-testid="refused-write">
                  <p className="font-semibold">{w.what}</p>
                  <p className="text-sm text-ink-600">
                    Made {when(w.madeAt)}, refused {when(w.refusal!.at)}.
                  </p>
                  <FormError message={w.refusal!.reason} />
                  <Button tone="secondary" className="mt-2" onClick={() => void discardQueued(w.key)}>
                    Discard
                  </Button>
                </li>
              ))}
            </ul>
          </Panel>
        ) : null}
        <Panel title="What works offline, and what does not" id="what-works">
          <h3 className="font-semibold">Works offline, for rigs kept on this phone</h3>
          <ul className="list-disc space-y-1 pl-6">
            <li>Reading the rig: its inputs, its figures and diagram (worked out again on this phone by the same engine), its verdicts and cautions.</li>
            <li>Its rig card, as the print page and as the PDF.</li>
            <li>Ticking its checklist and recording load-cell readings: they wait here and are sent when the signal returns.</li>
          </ul>
          <h3 className="pt-2 font-semibold">Needs a connection</h3>
          <ul className="list-disc space-y-1 pl-6">
            <li>Rigs never opened on this phone, and anything changed on the server since a rig was synced.</li>
            <li>Starting a checklist run, saving a revision, submitting one for review or signing it off.</li>
            <li>The prediction beside a reading: the server works it out when the reading arrives.</li>
            <li>Kit, Slip bench, Sites, Crew and account pages.</li>
          </ul>
        </Panel>
      </div>
    </>
  );
}
