"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/components/forms/call-api";
import { judgeAgreement, SAME_FIGURE, type Difference } from "@/lib/rig-form/compare-results";
import type { Evaluation } from "./evaluation";

type Outcome =
  | { kind: "agrees"; version: string; exact: boolean; largestRelative: number }
  | { kind: "differs"; differences: Difference[] }
  | { kind: "refused"; message: string };

interface Checked {
  /** The input the server was asked about: an outcome for another input is not shown. */
  input: string;
  outcome: Outcome;
}

const MOST_DIFFERENCES_SHOWN = 8;

/** Sends the current input to the server's engine and says whether its figures (the ones of record) match the browser's. */
export function ServerCheck({ evaluation }: { evaluation: Evaluation }) {
  const [checked, setChecked] = useState<Checked | null>(null);
  const [busy, setBusy] = useState(false);
  const current = evaluation.kind === "figures" ? JSON.stringify(evaluation.input) : null;
  const outcome = checked && checked.input === current ? checked.outcome : null;

  async function check() {
    if (evaluation.kind !== "figures" || current === null) return;
    setBusy(true);
    const answer = await callApi("POST", "/api/compute", evaluation.input);
    // Compare JSON with JSON: what the browser would have sent back is what the server did send.
    const browser: unknown = JSON.parse(JSON.stringify(evaluation.result));
    let next: Outcome;
    if (answer.ok) {
      const agreement = judgeAgreement(browser, answer.body);
      next = agreement.agrees
        ? { kind: "agrees", version: String(answer.body.engineVersion), exact: agreement.exact, largestRelative: agreement.largestRelative }
        : { kind: "differs", differences: agreement.disagreements };
    } else {
      next = { kind: "refused", message: Object.values(answer.fieldErrors)[0] ?? answer.error };
    }
    setChecked({ input: current, outcome: next });
    setBusy(false);
  }

  return (
    <section aria-labelledby="server-check" className="space-y-3 rounded-panel border-2 border-ink-300 bg-white p-4">
      <h2 id="server-check" className="text-lg">
        Server check
      </h2>
      <p className="text-sm text-ink-700">The server runs the same engine on the same input; its figures are the ones of record.</p>
      <Button onClick={check} disabled={busy || evaluation.kind !== "figures"}>
        {busy ? "Checking…" : "Check on the server"}
      </Button>
      <div role="status" aria-live="polite">
        {outcome?.kind === "agrees" ? (
          <p className="rounded-control border-2 border-ok-700 bg-ok-100 p-3 font-semibold text-ok-700">
            <span aria-hidden="true">✓ </span>The server agrees:{" "}
            {outcome.exact
              ? `every figure matches the browser's exactly (engine ${outcome.version}).`
              : `every figure matches the browser's to within ${outcome.largestRelative.toExponential(1)} of its value, far below the digits shown (engine ${outcome.version}; the server's JavaScript engine rounds some functions differently in the last bit). The server's figures are the ones of record.`}
          </p>
        ) : null}
        {outcome?.kind === "differs" ? (
          <div className="rounded-control border-2 border-danger-600 bg-danger-100 p-3 text-danger-700">
            <p className="font-semibold">
              <span aria-hidden="true">✗ </span>The server&apos;s figures differ from the browser&apos;s at {outcome.differences.length} place(s), by more than{" "}
              {SAME_FIGURE} of their value. Rig by the server&apos;s, and report this.
            </p>
            <ul className="mt-2 list-disc pl-5 font-mono text-sm">
              {outcome.differences.slice(0, MOST_DIFFERENCES_SHOWN).map((d) => (
                <li key={d.path}>
                  {d.path}: browser {JSON.stringify(d.browser)}, server {JSON.stringify(d.server)}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {outcome?.kind === "refused" ? (
          <p className="rounded-control border-2 border-danger-600 bg-danger-100 p-3 font-semibold text-danger-700">
            <span aria-hidden="true">✗ </span>The server gave no figures: {outcome.message}
          </p>
        ) : null}
      </div>
    </section>
  );
}
