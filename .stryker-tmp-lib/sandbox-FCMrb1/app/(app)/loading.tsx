// @ts-nocheck
export default function Loading() {
  return (
    <div role="status" aria-live="polite" className="animate-pulse text-sm text-muted">
      Loading…
    </div>
  );
}
