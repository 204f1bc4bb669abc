// @ts-nocheck
// The keys of the classroom view, on screen so the person at the laptop need not remember them.
const KEYS: [string, string][] = [
  ["→ or Page Down", "next step"],
  ["← or Page Up", "previous step"],
  ["Home / End", "first / last step"],
  ["← → on a focused slider", "move the slider (Tab to it first)"],
];

export function KeyGuide() {
  return (
    <aside aria-label="Keys" data-testid="key-guide" className="rounded-lg border border-line bg-panel px-4 py-2 text-base">
      <dl className="flex flex-wrap gap-x-6 gap-y-1">
        {KEYS.map(([k, what]) => (
          <div key={k} className="flex gap-2">
            <dt>
              <kbd className="rounded border border-line px-1.5 font-mono">{k}</kbd>
            </dt>
            <dd className="text-muted">{what}</dd>
          </div>
        ))}
      </dl>
    </aside>
  );
}
