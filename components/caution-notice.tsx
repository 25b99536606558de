import type { ReactNode } from "react";

const CAUTION_CLASSES = "rounded-panel border-2 border-caution-500 bg-caution-100 p-4 text-caution-800";

// The trade's cautions, shown wherever the product gives numbers someone may rig by.
export function CautionNotice({ compact = false }: { compact?: boolean }) {
  return (
    <aside aria-label="Safety cautions" className={CAUTION_CLASSES}>
      <p className="font-semibold">⚠ Estimates, not guarantees</p>
      <p className={compact ? "mt-1 text-sm" : "mt-1"}>
        Every figure comes from a model and from your crew&apos;s own gear data. Verify tensions with a load cell, always rig a backup and redundant anchors,
        follow the slackline standards in force where you rig (for example DIN 79400 for slackline systems and the International Slackline Association&apos;s
        highline-systems standard) and defer to local rules, land managers and qualified, trained riggers.
      </p>
    </aside>
  );
}

/** A page's own caution, where it records measurements rather than estimates (the Kit, the slip bench). */
export function Caution({ children }: { children: ReactNode }) {
  return <p className={`max-w-prose ${CAUTION_CLASSES}`}>⚠ {children}</p>;
}
