export default function Loading() {
  return (
    <div aria-busy="true" aria-live="polite" className="space-y-4">
      <span className="sr-only">Loading the line check…</span>
      <div className="h-9 w-64 animate-pulse rounded-control bg-ink-200" />
      <div className="h-24 animate-pulse rounded-panel bg-caution-100" />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,26rem)_minmax(0,1fr)]">
        <div className="h-96 animate-pulse rounded-panel bg-ink-100" />
        <div className="h-96 animate-pulse rounded-panel bg-ink-100" />
      </div>
    </div>
  );
}
