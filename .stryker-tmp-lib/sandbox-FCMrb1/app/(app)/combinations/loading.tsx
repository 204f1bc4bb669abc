// @ts-nocheck
export default function CombinationsLoading() {
  return (
    <div role="status" aria-live="polite" className="flex flex-col gap-3">
      <div className="h-8 w-64 animate-pulse rounded bg-panel" />
      <div className="h-40 animate-pulse rounded-lg border border-line bg-panel" />
      <span className="sr-only">Loading combinations…</span>
    </div>
  );
}
