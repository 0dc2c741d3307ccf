import { z } from "zod";
import { ROLES } from "@/lib/auth/roles";

// Shared by the forms and the route handlers.
export const emailSchema = z
  .string({ message: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .max(254, "That e-mail address is too long.")
  .email("Enter an e-mail address like name@example.org.");

export const passwordSchema = z
  .string({ message: "Choose a password." })
  .min(10, "Use at least 10 characters.")
  .max(200, "Use at most 200 characters.");

export const personNameSchema = z
  .string({ message: "Enter your name." })
  .trim()
  .min(1, "Enter your name.")
  .max(120, "Use at most 120 characters.");

export const roleSchema = z.enum(ROLES, { message: "Choose organiser, volunteer or builder." });

export const signUpInputSchema = z.object({
  name: personNameSchema,
  email: emailSchema,
  password: passwordSchema,
  groupName: z
    .string({ message: "Name your group." })
    .trim()
    .min(3, "Use at least 3 characters.")
    .max(120, "Use at most 120 characters."),
});
export type SignUpInput = z.infer<typeof signUpInputSchema>;

export const invitationInputSchema = z.object({ email: emailSchema, role: roleSchema });
export type InvitationInput = z.infer<typeof invitationInputSchema>;

export const tokenSchema = z.string({ message: "The link is incomplete." }).regex(/^[A-Za-z0-9_-]{32,64}$/, "The link is incomplete.");

/** Accepting: a new person sends name and password; someone already signed in sends only the token. */
export const acceptInvitationInputSchema = z.object({
  token: tokenSchema,
  name: personNameSchema.optional(),
  password: passwordSchema.optional(),
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationInputSchema>;

export const memberRoleInputSchema = z.object({ role: roleSchema });

/** Handing the organiser role to another member: what the one handing over becomes (or leaves). */
export const HAND_OVER_THEN = ["volunteer", "builder", "leave"] as const;
export const handOverInputSchema = z.object({
  then: z.enum(HAND_OVER_THEN, { message: "Choose what you become after handing over: volunteer, builder, or leave the group." }),
});
export type HandOverInput = z.infer<typeof handOverInputSchema>;

/** Leaving must be meant: the body says so ({confirm: true}), so no stray or generated request leaves by accident. */
export const leaveGroupInputSchema = z.object({ confirm: z.literal(true, { message: "Send confirm: true to leave the group." }) });

export const resetRequestInputSchema = z.object({ email: emailSchema });
export const resetConfirmInputSchema = z.object({ token: tokenSchema, password: passwordSchema });

export const switchGroupInputSchema = z.object({ groupId: z.string().uuid("Choose one of your groups.") });

/** The one answer to a reset request, known address or not. */
export const RESET_ANSWER =
  "If that address has a Cantrove account, a link to choose a new password is on its way. It works once, for an hour.";

export const verifyEmailInputSchema = z.object({ token: tokenSchema });
export const resendVerificationInputSchema = z.object({ email: emailSchema });

/** Thrown by sign-in after a matching password whose address is not proven yet; the form offers to send the link again. */
export const EMAIL_UNPROVEN = "Open the link we e-mailed to this address to finish setting up your account, then sign in.";

/** The one answer to a request for a new link, known address or not. */
export const RESEND_ANSWER =
  "If that address has an account still waiting for its link, a new link is on its way. Check your inbox and spam folder.";
