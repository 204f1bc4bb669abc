"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
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
          const res = await fetch(`/api/datalogs/${id}`, { method: "DELETE" });
          if (res.status === 204) {
            router.push("/datalogs");
            router.refresh();
          } else {
            setBusy(false);
            setError(((await res.json().catch(() => ({}))) as { error?: string }).error ?? "The log could not be deleted.");
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
