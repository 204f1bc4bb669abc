// @ts-nocheck
"use client";
// The planner's save bar: a revision note and Save for those who may write, Duplicate for the rest.
import { Button } from "@/components/ui/button";

export type SaveMessage = { tone: "ok" | "danger"; text: string };

type SaveBarProps = {
  canWrite: boolean;
  note: string;
  onNote: (note: string) => void;
  onSave: (e: React.FormEvent) => void;
  saving: boolean;
  dirty: boolean;
  /** A field is invalid: nothing to save until it is fixed. */
  invalid: boolean;
  onDuplicate: () => void;
  duplicating: boolean;
  message: SaveMessage | null;
};

export function SaveBar({ canWrite, note, onNote, onSave, saving, dirty, invalid, onDuplicate, duplicating, message }: SaveBarProps) {
  return (
    <section aria-label="Save" className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-panel p-3">
      {canWrite ? (
        <form
          onSubmit={(e) => {
            e.preventDefault();
            onSave(e);
          }}
          className="flex flex-1 flex-wrap items-end gap-3"
        >
          <label className="flex min-w-64 flex-1 flex-col gap-1 text-sm">
            <span className="font-medium">Revision note</span>
            <input
              type="text"
              value={note}
              maxLength={500}
              onChange={(e) => onNote(e.target.value)}
              placeholder="What changed, e.g. smaller blower pulley"
              className="rounded-md border border-line bg-bg px-2.5 py-1.5"
            />
          </label>
          {/* With nothing changed there is nothing to save: no empty revisions. */}
          <Button type="submit" disabled={saving || !dirty || invalid} title={!dirty ? "Nothing has changed since the last save" : undefined}>
            {saving ? "Saving…" : "Save revision"}
          </Button>
          <span className="text-xs text-muted" aria-live="polite">
            {dirty ? "Unsaved changes" : "No unsaved changes"}
          </span>
        </form>
      ) : (
        <div className="flex flex-1 flex-wrap items-center gap-3">
          <p className="text-sm text-muted">You can try changes here, but not save them to this combination. Duplicate it to keep your own copy.</p>
          <Button type="button" onClick={onDuplicate} disabled={duplicating}>
            {duplicating ? "Duplicating…" : "Duplicate to edit"}
          </Button>
        </div>
      )}
      <div role="status" aria-live="polite" className="basis-full text-sm empty:hidden">
        {message ? <span className={message.tone === "ok" ? "text-ok" : "text-danger"}>{message.text}</span> : null}
      </div>
    </section>
  );
}
