// @ts-nocheck
"use client";
// One button's request at a time, with its outcome to show: what the sheet, order and link
// panels share. `run` shows the success text `fn` returns, or the error's message.
import { useRouter } from "next/navigation";
import { useState } from "react";

export type ActionMessage = { tone: "ok" | "danger"; text: string };

export function useAction() {
  const router = useRouter();
  const [busy, setBusy] = useState<string | null>(null);
  const [message, setMessage] = useState<ActionMessage | null>(null);

  async function run(label: string, fn: () => Promise<string>) {
    setBusy(label);
    setMessage(null);
    try {
      setMessage({ tone: "ok", text: await fn() });
    } catch (e) {
      setMessage({ tone: "danger", text: e instanceof Error ? e.message : "That did not work." });
    } finally {
      setBusy(null);
      router.refresh();
    }
  }

  return { busy, message, run };
}
