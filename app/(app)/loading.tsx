export default function Loading() {
  return (
    <div aria-busy="true" aria-live="polite" className="space-y-4">
      <span className="sr-only">Loading…</span>
      <div className="h-9 w-56 animate-pulse rounded-control bg-ink-200" />
      <div className="h-40 animate-pulse rounded-panel bg-ink-100" />
    </div>
  );
}
