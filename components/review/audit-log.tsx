import type { AuditEntry } from "@/db/audit-log";
import { AUDIT_ACTION_WORDS } from "@/lib/review/steps";
import { when } from "@/lib/when";

/** Each step of the rig's life, newest first: who did what to which revision, when, with their note. */
export function AuditLog({ entries }: { entries: AuditEntry[] }) {
  if (!entries.length) return <p>Nothing recorded yet.</p>;
  return (
    <ol className="space-y-2 text-sm">
      {entries.map((e) => (
        <li key={e.id} className="border-b border-ink-100 pb-2">
          <span className="text-ink-500">{when(e.at)}</span> · <strong>{e.actorName}</strong> {AUDIT_ACTION_WORDS[e.action]}
          {e.revisionNumber ? ` (revision ${e.revisionNumber})` : ""}
          {e.note ? <span className="block whitespace-pre-line pl-4 text-ink-700">“{e.note}”</span> : null}
        </li>
      ))}
    </ol>
  );
}
