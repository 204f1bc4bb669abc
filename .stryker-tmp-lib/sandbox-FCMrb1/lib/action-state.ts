/** What every server action returns to its form (for useActionState): ok, or a message with per-field errors. */
// @ts-nocheck

export type ActionState<T = unknown> = {
  ok: true;
  data?: T;
  message?: string;
} | {
  ok: false;
  message: string;
  fieldErrors?: Record<string, string[]>;
  status: number;
};