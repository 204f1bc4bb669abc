// The editor's panels: a fieldset with its legend, in one look.
export const grid = "grid grid-cols-1 gap-3 sm:grid-cols-2";

export function EditorBox({ legend, children }: { legend: string; children: React.ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-3 rounded-lg border border-line bg-panel p-3">
      <legend className="px-1 text-sm font-semibold">{legend}</legend>
      {children}
    </fieldset>
  );
}
