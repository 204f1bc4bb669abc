// @ts-nocheck
"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError, apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";

export function DeleteLogButton({ id, name }: { id: string; name: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <span className="inline-flex items-center gap-2">
      <Button
        variant="danger"
        disabled={busy}
        onClick={async () => {
          if (!window.confirm(`Delete the log “${name}” and its samples? This cannot be undone.`)) return;
          setBusy(true);
          try {
            await apiJson(`/api/datalogs/${id}`, { method: "DELETE" });
            router.push("/datalogs");
            router.refresh();
          } catch (e) {
            setBusy(false);
            setError((e instanceof ApiError && e.serverMessage) || "The log could not be deleted.");
          }
        }}
      >
        Delete log
      </Button>
      {error ? (
        <span role="alert" className="text-sm text-danger">
          {error}
        </span>
      ) : null}
    </span>
  );
}
