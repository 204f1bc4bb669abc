// @ts-nocheck
"use client";
import { useActionState, useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import type { Role } from "@/db/schema";
import type { ActionState } from "@/lib/action-state";

const ROLE_NAMES: Record<Role, string> = { member: "Member", tuner: "Tuner", sales: "Sales", instructor: "Instructor", admin: "Admin" };

/** The server actions behind the controls, passed in by the page. */
export type UserAccessActions = {
  setRole: (id: string, prev: ActionState | undefined, form: FormData) => Promise<ActionState<{ role: string }>>;
  setDisabled: (id: string, disabled: boolean) => Promise<ActionState<{ disabled: boolean }>>;
};
type UserAccessControlsProps = { id: string; email: string; role: Role; disabled: boolean; self: boolean; actions: UserAccessActions };

/** One account's role select and disable/enable switch. Your own row is read-only. */
export function UserAccessControls({ id, email, role, disabled, self, actions }: UserAccessControlsProps) {
  const [state, action, pending] = useActionState(actions.setRole.bind(null, id), undefined);
  const [toggling, startToggle] = useTransition();
  const [toggleMsg, setToggleMsg] = useState<{ ok: boolean; text: string } | null>(null);
  const [selected, setSelected] = useState<Role>(role);
  const selectId = `role-${id}`;

  if (self) {
    return (
      <p className="text-sm">
        {ROLE_NAMES[role]} <span className="text-muted">(this is you: another admin can change your role)</span>
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-1">
      <div className="flex flex-wrap items-center gap-2">
        <form action={action} className="flex items-center gap-2">
          <label htmlFor={selectId} className="sr-only">
            Role of {email}
          </label>
          <select id={selectId} name="role" value={selected} onChange={(e) => setSelected(e.target.value as Role)} className="rounded-md border border-line bg-bg px-2 py-1 text-sm">
            {(Object.keys(ROLE_NAMES) as Role[]).map((r) => (
              <option key={r} value={r}>
                {ROLE_NAMES[r]}
              </option>
            ))}
          </select>
          <Button type="submit" variant="secondary" disabled={pending || selected === role} aria-label={`Save role of ${email}`}>
            {pending ? "Saving…" : "Save role"}
          </Button>
        </form>
        <Button
          variant={disabled ? "secondary" : "danger"}
          disabled={toggling}
          aria-label={`${disabled ? "Enable" : "Disable"} ${email}`}
          onClick={() =>
            startToggle(async () => {
              const r = await actions.setDisabled(id, !disabled);
              setToggleMsg(r.ok ? { ok: true, text: r.data?.disabled ? "Disabled: they are signed out on their next request." : "Enabled." } : { ok: false, text: r.message });
            })
          }
        >
          {disabled ? "Enable" : "Disable"}
        </Button>
        {disabled ? <span className="rounded border border-danger px-1 text-xs text-danger">disabled</span> : null}
      </div>
      <div aria-live="polite" className="text-xs">
        {state ? (
          state.ok ? (
            <p className="text-ok">Saved: {email} is now {ROLE_NAMES[(state.data?.role as Role) ?? role]}.</p>
          ) : (
            <p role="alert" className="text-danger">{state.message}</p>
          )
        ) : null}
        {toggleMsg ? <p className={toggleMsg.ok ? "text-ok" : "text-danger"} role={toggleMsg.ok ? undefined : "alert"}>{toggleMsg.text}</p> : null}
      </div>
    </div>
  );
}
