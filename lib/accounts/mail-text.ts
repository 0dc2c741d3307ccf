import { ROLE_LABEL, type Role } from "@/lib/auth/roles";

// The words of the account e-mails; pure so they can be read in tests.
export function invitationMail(args: { groupName: string; inviterName: string; role: Role; link: string; days: number }) {
  const role = ROLE_LABEL[args.role].toLowerCase();
  return {
    subject: `You're invited to ${args.groupName} on Cantrove`,
    text: [
      `${args.inviterName} invited you to join ${args.groupName} on Cantrove as a ${role}.`,
      "",
      `Accept the invitation: ${args.link}`,
      "",
      `The link works once and expires in ${args.days} days. If you did not expect it, ignore this e-mail.`,
    ].join("\n"),
  };
}

export function resetMail(args: { link: string; minutes: number }) {
  return {
    subject: "Reset your Cantrove password",
    text: [
      "Someone asked to reset the password of the Cantrove account with this e-mail address.",
      "",
      `Choose a new password: ${args.link}`,
      "",
      `The link works once and expires in ${args.minutes} minutes. If it was not you, ignore this e-mail; your password stays as it is.`,
    ].join("\n"),
  };
}

export function verificationMail(args: { link: string; hours: number }) {
  return {
    subject: "Confirm your e-mail address for Cantrove",
    text: [
      "Someone opened a Cantrove account with this e-mail address.",
      "",
      `If it was you, confirm the address: ${args.link}`,
      "",
      `The link expires in ${args.hours} hours. Until it is opened, nobody can sign in to that account.`,
      "If it was not you, ignore this e-mail and do not open the link.",
    ].join("\n"),
  };
}

export function signUpAttemptMail(args: { signInLink: string; resetLink: string }) {
  return {
    subject: "Someone tried to open a Cantrove account with your address",
    text: [
      "Someone tried to open a new Cantrove account with this e-mail address. It already has an account, so nothing was created.",
      "",
      `If it was you, sign in: ${args.signInLink}`,
      `Forgot the password? Choose a new one: ${args.resetLink}`,
      "",
      "If it was not you, you need do nothing: your account stays as it is.",
    ].join("\n"),
  };
}
