// @ts-nocheck
import type { ReactNode } from "react";

type NoticeProps = { tone?: "info" | "warning" | "danger" | "ok"; title?: string; children: ReactNode; className?: string };

const tones = {
  info: "border-line bg-panel",
  warning: "border-warn bg-warn-bg text-warn",
  danger: "border-danger bg-danger-bg text-danger",
  ok: "border-ok text-ok bg-panel",
};

export function Notice({ tone = "info", title, children, className = "" }: NoticeProps) {
  return (
    <div role={tone === "danger" ? "alert" : "status"} className={`rounded-md border px-3 py-2 text-sm ${tones[tone]} ${className}`}>
      {title ? <p className="font-semibold">{title}</p> : null}
      <div>{children}</div>
    </div>
  );
}
