import { classNames } from "@/lib/class-names";

/** In service or retired: a word and a mark, never colour alone. */
export function StatusBadge({ retiredOn }: { retiredOn: string | null }) {
  return (
    <span
      className={classNames(
        "inline-flex items-center gap-1 whitespace-nowrap rounded-control px-2 py-0.5 text-xs font-semibold",
        retiredOn ? "bg-ink-100 text-ink-700" : "bg-ok-100 text-ok-700",
      )}
    >
      {retiredOn ? `✕ Retired ${retiredOn}` : "✓ In service"}
    </span>
  );
}
