import type { ReactNode } from "react";
import { ScrollHint } from "./scroll-hint";

/**
 * A frame for a table wider than a phone: it scrolls sideways instead of squeezing the columns, says so
 * when columns are out of sight, and takes focus so that the arrow keys scroll it too.
 */
export function ScrollFrame({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <ScrollHint />
      <div
        tabIndex={0}
        role="region"
        aria-label={`${label}, scrolls sideways`}
        className="overflow-x-auto rounded-panel border border-ink-200 bg-white shadow-panel"
      >
        {children}
      </div>
    </div>
  );
}
