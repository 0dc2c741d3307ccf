// Safe to import anywhere: the state a server action declared with action()
// (lib/api/action.ts) hands back to useActionState. Plain data, so React can
// send it to the browser and, with JavaScript off, render it into the page.

export interface ActionState<T = unknown> {
  /** null before the first answer. */
  ok: boolean | null;
  /** The answer to show above the form: a refusal's message, or what happened. */
  message: string | null;
  /** Field name → the first message for it, as endpoint()'s 422 `fields`. */
  fields: Record<string, string>;
  /** What was typed (secrets left out), so a refused form comes back filled in. */
  values: Record<string, string>;
  /** The work's answer when ok. */
  data?: T;
}

export const IDLE: ActionState<never> = { ok: null, message: null, fields: {}, values: {} };

/** The value to put back into a field: what was typed on a refusal, else `fallback`. */
export function typed(state: ActionState<unknown>, name: string, fallback = ""): string {
  return state.ok === false && name in state.values ? state.values[name] : fallback;
}
