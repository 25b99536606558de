import { classNames } from "@/lib/class-names";

export type VerdictTone = "ok" | "danger" | "caution";

const TONES: Record<VerdictTone, { icon: string; classes: string }> = {
  ok: { icon: "✓", classes: "border-ok-700 bg-ok-100 text-ok-700" },
  danger: { icon: "✗", classes: "border-danger-600 bg-danger-100 text-danger-700" },
  caution: { icon: "?", classes: "border-caution-500 bg-caution-100 text-caution-800" },
};

/** A pass/fail word with its icon and colour: the word and the icon carry the meaning, never the colour alone. */
export function Verdict({ tone, children }: { tone: VerdictTone; children: string }) {
  const { icon, classes } = TONES[tone];
  return (
    <span className={classNames("inline-flex items-center gap-1 rounded-control border-2 px-2 py-0.5 font-semibold", classes)}>
      <span aria-hidden="true">{icon}</span>
      {children}
    </span>
  );
}
