// Shared looks of the editor's fieldsets.
export const box = "flex flex-col gap-3 rounded-lg border border-line bg-panel p-3";
export const grid = "grid grid-cols-1 gap-3 sm:grid-cols-2";
export const legend = "px-1 text-sm font-semibold";
