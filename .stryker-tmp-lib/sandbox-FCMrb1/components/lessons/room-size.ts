// @ts-nocheck
"use client";
// How big the classroom chart is drawn: on a projector it fills most of the screen with labels
// readable from the back of the room (≥ 20 px); on a phone it fits the screen with small labels,
// so axis titles do not run into the ticks.
import { useEffect, useState } from "react";

export type RoomSize = { height: string | number; fontSize: number };

/** Projector and desktop: at least 560 px and 62 % of the window's height; labels of 22 px. */
export const ROOM: RoomSize = { height: "max(560px, 62vh)", fontSize: 22 };
/** Phone (narrower than 768 px): a chart that leaves room for the controls below it. */
export const POCKET: RoomSize = { height: 340, fontSize: 12 };

export function useRoomSize(): RoomSize {
  const [size, setSize] = useState<RoomSize>(ROOM);
  useEffect(() => {
    const q = window.matchMedia("(max-width: 767px)");
    const update = () => setSize(q.matches ? POCKET : ROOM);
    update();
    q.addEventListener("change", update);
    return () => q.removeEventListener("change", update);
  }, []);
  return size;
}
