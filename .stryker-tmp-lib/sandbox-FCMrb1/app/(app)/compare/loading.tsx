// @ts-nocheck
export default function CompareLoading() {
  return (
    <div role="status" aria-live="polite" className="flex flex-col gap-3">
      <div className="h-7 w-48 animate-pulse rounded bg-line" />
      <div className="h-80 animate-pulse rounded-lg bg-line" />
      <span className="sr-only">Loading side by side…</span>
    </div>
  );
}
