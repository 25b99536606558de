import Link from "next/link";
import { changeText } from "@/physics";
import type { SignOff } from "@/db/reviews";
import type { Verification } from "@/lib/review/verification";
import type { RevisionMeta, RevisionState } from "@/lib/validations/rigs";
import { when } from "@/lib/when";

const STATE_PHRASES: Record<RevisionState, string> = { draft: "a draft", in_review: "in review", signed_off: "signed off", superseded: "superseded" };

function Reevaluated({ verification }: { verification: Verification }) {
  const r = verification.reevaluation;
  const engines = r.engineThen === r.engineNow ? `engine ${r.engineNow}` : `engine ${r.engineThen} when signed, ${r.engineNow} today`;
  if (r.kind === "same") return <p>Evaluated again with today&apos;s engine: same figures ({engines}).</p>;
  if (r.kind === "refused") {
    return (
      <p role="alert" className="font-semibold text-danger-700">
        Today&apos;s engine refuses the signed inputs ({engines}): {r.reason} Have the rig checked again before it is walked.
      </p>
    );
  }
  return (
    <div className="space-y-2">
      <p role="alert" className="font-semibold text-caution-800">
        Evaluated again with today&apos;s engine, {r.moved.length === 1 ? "one figure moved" : `${r.moved.length} figures moved`} ({engines}):
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead>
            <tr className="border-b border-ink-200">
              <th className="py-1 pr-2">Figure</th>
              <th className="py-1 pr-2">Signed</th>
              <th className="py-1 pr-2">Today</th>
              <th className="py-1">Change</th>
            </tr>
          </thead>
          <tbody>
            {r.moved.map((m) => (
              <tr key={m.label} className="border-b border-ink-100">
                <th scope="row" className="py-1 pr-2 font-medium">
                  {m.label}
                </th>
                <td className="py-1 pr-2 tabular-nums">{m.then}</td>
                <td className="py-1 pr-2 tabular-nums">{m.now}</td>
                <td className="py-1 tabular-nums">{Number.isFinite(m.changePercent) ? changeText(m.changePercent, 2) : "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/** Which revision of the rig stands signed off, checked again, and whether the latest is a draft that is not. */
export function SignOffStatus({
  rigId,
  signOff,
  verification,
  latest,
}: {
  rigId: string;
  signOff: SignOff | null;
  verification: Verification | null;
  latest: RevisionMeta;
}) {
  const latestUnsigned = !signOff || signOff.revisionId !== latest.id;
  return (
    <div
      className={`space-y-2 rounded-panel border-2 p-4 ${signOff ? "border-spruce-600 bg-spruce-50" : "border-caution-500 bg-caution-100"}`}
      data-testid="sign-off-status"
    >
      {signOff ? (
        <>
          <p className="font-semibold">
            <Link href={`/rigs/${rigId}?revision=${signOff.revisionId}`}>Revision {signOff.revisionNumber}</Link> is signed off, by {signOff.signedByName} on{" "}
            {when(signOff.signedAt)}.
          </p>
          {verification ? (
            verification.hashMatches ? (
              <p>
                Its inputs, figures and engine version are as signed (SHA-256 <code className="text-sm">{signOff.contentHash.slice(0, 16)}…</code>).
              </p>
            ) : (
              <p role="alert" className="font-semibold text-danger-700">
                Its stored inputs or figures no longer match what was signed: do not rig it; tell the crew&apos;s lead.
              </p>
            )
          ) : null}
          {verification ? <Reevaluated verification={verification} /> : null}
          <p>
            <a href="#on-site">On site: the checklist and load-cell readings</a>
          </p>
        </>
      ) : (
        <p className="font-semibold">No revision of this rig is signed off yet: nobody should walk it until a lead signs it off.</p>
      )}
      {latestUnsigned ? (
        <p className={signOff ? "font-semibold text-caution-800" : undefined}>
          Revision {latest.number}, the latest, is {STATE_PHRASES[latest.state]} and is not signed off
          {latest.state === "in_review" ? (
            <>
              : <Link href={`/rigs/${rigId}/review`}>see the review</Link>.
            </>
          ) : (
            "."
          )}
        </p>
      ) : null}
    </div>
  );
}
