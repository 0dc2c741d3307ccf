import type { ActionState } from "@/lib/api/action-state";

/** The message above a refused form: only when no field carries its own (a 422 shows beside the fields). */
export function fieldsMessage(state: ActionState<unknown>): string | null {
  return state.ok === false && !Object.keys(state.fields).length ? state.message : null;
}
