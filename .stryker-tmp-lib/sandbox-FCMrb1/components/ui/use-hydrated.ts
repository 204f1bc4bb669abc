// @ts-nocheck
"use client";
import { useSyncExternalStore } from "react";

const never = () => () => {};

/**
 * False in the server's HTML and while React hydrates it, true once this component runs in the
 * browser. For controls the server renders before their code has arrived: typing into them then
 * would be lost when the form library takes them over, so they start disabled.
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(never, () => true, () => false);
}
