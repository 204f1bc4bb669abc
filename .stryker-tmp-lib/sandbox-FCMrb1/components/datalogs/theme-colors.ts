// @ts-nocheck
"use client";
import { useEffect, useState } from "react";

/** The page's foreground, muted and border colours (CSS variables), for chart axes in light and dark. */
export function useThemeColors() {
  const [c, setC] = useState({ fg: "#16191d", muted: "#5b636d", line: "#d9dde2" });
  useEffect(() => {
    const read = () => {
      const s = getComputedStyle(document.documentElement);
      setC({ fg: s.getPropertyValue("--pw-fg").trim() || "#16191d", muted: s.getPropertyValue("--pw-muted").trim() || "#5b636d", line: s.getPropertyValue("--pw-border").trim() || "#d9dde2" });
    };
    read();
    const mo = new MutationObserver(read);
    mo.observe(document.documentElement, { attributes: true, attributeFilter: ["class"] });
    const mq = window.matchMedia("(prefers-color-scheme: dark)");
    mq.addEventListener("change", read);
    return () => {
      mo.disconnect();
      mq.removeEventListener("change", read);
    };
  }, []);
  return c;
}
