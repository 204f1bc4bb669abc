// @ts-nocheck
export default function PlannerLoading() {
  return (
    <div role="status" aria-live="polite" className="flex flex-col gap-3">
      <div className="h-7 w-72 animate-pulse rounded bg-line" />
      <div className="grid grid-cols-1 gap-4 lg:grid-cols-[5fr_7fr]">
        <div className="h-96 animate-pulse rounded-lg bg-line" />
        <div className="h-96 animate-pulse rounded-lg bg-line" />
      </div>
      <span className="sr-only">Loading the planner…</span>
    </div>
  );
}
