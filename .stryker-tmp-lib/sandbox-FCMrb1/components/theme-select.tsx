// @ts-nocheck
"use client";
import { useState } from "react";

export type Theme = "system" | "light" | "dark";

/** Light, dark or follow the system; kept in a cookie so the server renders the right theme. */
export function ThemeSelect({ initial }: { initial: Theme }) {
  const [theme, setTheme] = useState<Theme>(initial);
  function choose(next: Theme) {
    setTheme(next);
    document.cookie = `pw-theme=${next}; path=/; max-age=31536000; samesite=lax`;
    const root = document.documentElement;
    root.classList.remove("theme-light", "theme-dark");
    if (next !== "system") root.classList.add(`theme-${next}`);
  }
  return (
    <label className="flex items-center gap-1 text-xs text-muted">
      <span>Theme</span>
      <select
        value={theme}
        onChange={(e) => choose(e.target.value as Theme)}
        className="rounded border border-line bg-panel px-1 py-0.5 text-xs text-fg"
      >
        <option value="system">System</option>
        <option value="light">Light</option>
        <option value="dark">Dark</option>
      </select>
    </label>
  );
}
