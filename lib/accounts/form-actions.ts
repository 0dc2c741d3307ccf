"use server";

// The account forms' server actions (declared with action(), lib/api/action.ts):
// the same schemas, rate limits and functions as the JSON routes in
// app/api/{signup,password-reset,invitations}, which stay as they are.
import { after } from "next/server";
import { redirect } from "next/navigation";
import { action } from "@/lib/api/action";
import type { ActionState } from "@/lib/api/action-state";
import { INVITE_LIMITS, RESET_REQUEST_LIMITS, SIGN_UP_LIMITS, TOKEN_LIMITS } from "./limits";
import { acceptInvitation, createInvitation } from "./invitations";
import { confirmPasswordReset, requestPasswordReset } from "./resets";
import { acceptInvitationInputSchema, invitationInputSchema, passwordSchema, personNameSchema, RESET_ANSWER, resetConfirmInputSchema, resetRequestInputSchema, signUpInputSchema } from "./schemas";
import { signUp } from "./sign-up";

const signUpRun = action(
  {
    who: "anyone",
    schema: signUpInputSchema,
    limits: SIGN_UP_LIMITS,
  },
  // An address that already has an account gets this same answer (its owner gets a mail).
  async ({ input }) => {
    await signUp(input);
    return { email: input.email };
  },
);
export async function signUpAction(previous: ActionState<{ email: string }>, formData: FormData) {
  return signUpRun(previous, formData);
}

const resetRequestRun = action(
  {
    who: "anyone",
    schema: resetRequestInputSchema,
    limits: RESET_REQUEST_LIMITS,
  },
  // The same answer at the same speed whether or not the address has an account: the work runs after.
  async ({ input }) => {
    after(() => requestPasswordReset(input.email).catch((error) => console.error("[cantrove] reset mail failed", error)));
    return { message: RESET_ANSWER };
  },
);
export async function resetRequestAction(previous: ActionState<{ message: string }>, formData: FormData) {
  return resetRequestRun(previous, formData);
}

const resetConfirmRun = action(
  { who: "anyone", schema: resetConfirmInputSchema, secret: ["password", "token"], limits: TOKEN_LIMITS },
  async ({ input }) => {
    await confirmPasswordReset(input.token, input.password);
    return { changed: true };
  },
);
export async function resetConfirmAction(previous: ActionState<{ changed: boolean }>, formData: FormData) {
  return resetConfirmRun(previous, formData);
}

const inviteRun = action(
  { who: ["organiser"], schema: invitationInputSchema, limits: INVITE_LIMITS },
  async ({ actor, input }) => {
    await createInvitation(actor, input);
    return { email: input.email };
  },
);
export async function inviteAction(previous: ActionState<{ email: string }>, formData: FormData) {
  return inviteRun(previous, formData);
}

const newPersonSchema = acceptInvitationInputSchema.extend({ name: personNameSchema, password: passwordSchema });
const acceptRun = action(
  { who: "anyone", schema: newPersonSchema, secret: ["password", "token"], limits: TOKEN_LIMITS },
  // A new person: no session to read (someone signed in uses the one-click form, which needs the session).
  async ({ input }) => acceptInvitation(input, null),
);
export async function acceptInvitationAction(previous: ActionState<unknown>, formData: FormData): Promise<ActionState<unknown>> {
  const state = await acceptRun(previous, formData);
  if (state.ok) redirect(`/signin?joined=1&email=${encodeURIComponent((state.data as { email: string }).email)}`);
  return state;
}
