// @ts-nocheck
"use client";
import { useEffect, useState } from "react";

/** Fills the projector's screen with the page (the browser's Escape key leaves). */
export function FullscreenButton() {
  const [full, setFull] = useState(false);
  useEffect(() => {
    const on = () => setFull(!!document.fullscreenElement);
    document.addEventListener("fullscreenchange", on);
    return () => document.removeEventListener("fullscreenchange", on);
  }, []);
  return (
    <button
      type="button"
      className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm"
      onClick={() => (document.fullscreenElement ? document.exitFullscreen() : document.documentElement.requestFullscreen()).catch(() => {})}
    >
      {full ? "Leave full screen" : "Full screen"}
    </button>
  );
}
