// @ts-nocheck
import { cookies } from "next/headers";
import { ThemeSelect, type Theme } from "./theme-select";

/** Reads the theme cookie on the server so the select starts on the right choice. */
export async function ThemeSwitch() {
  const v = (await cookies()).get("pw-theme")?.value;
  const initial: Theme = v === "light" || v === "dark" ? v : "system";
  return <ThemeSelect initial={initial} />;
}
