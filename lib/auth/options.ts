import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import bcrypt from "bcryptjs";
import { z } from "zod";
import { findUserForSignIn, loadActor } from "./queries";
import { signInSucceeded, takeSignInTry } from "@/lib/accounts/sign-in-limits";
import { clientAddress } from "@/lib/net/client-address";
import { EMAIL_UNPROVEN, switchGroupInputSchema } from "@/lib/accounts/schemas";
import { safeCallbackUrl } from "./safe-redirect";

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().email(),
  password: z.string().min(1).max(200),
});

// A fixed hash to compare against when the e-mail is unknown, so a miss takes
// as long as a wrong password and the answer reveals nothing.
const DUMMY_HASH = "$2b$10$eDGPikBjhIdaG5/0Hm2lf.chudChbRF3XkJe.NfaBSqTxb5A/WfHK";

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: "/signin" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      // Throwing sends the message to the form as `error`; returning null is the
      // generic "does not match", the same for unknown e-mails and wrong passwords.
      async authorize(raw, req) {
        const client = clientAddress(req?.headers as Record<string, string | undefined> | undefined);
        const email = String(raw?.email ?? "").trim().toLowerCase().slice(0, 254);
        // The try is counted before the hash is checked, so parallel guesses
        // beyond the limit never reach bcrypt.
        await takeSignInTry(email, client);
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) return null;
        const user = await findUserForSignIn(parsed.data.email);
        const ok = await bcrypt.compare(parsed.data.password, user?.password_hash ?? DUMMY_HASH);
        if (!user || !user.password_hash || !ok) return null;
        await signInSucceeded(email, client);
        // Only after the password matched, so this says nothing to a stranger.
        if (!user.email_verified_at) throw new Error(EMAIL_UNPROVEN);
        const actor = await loadActor(user.id);
        return { id: user.id, email: user.email, name: user.name, groupId: actor?.group.id ?? null, sessionVersion: user.session_version };
      },
    }),
  ],
  callbacks: {
    // Every redirect next-auth makes (callbackUrl included) stays on this site;
    // a malformed one goes home instead of failing.
    async redirect({ url, baseUrl }) {
      return safeCallbackUrl(url, baseUrl);
    },
    async jwt({ token, user, trigger, session }) {
      if (user) {
        token.userId = user.id;
        token.groupId = (user as { groupId?: string | null }).groupId ?? null;
        // Compared on every request (lib/auth/session.ts): a bump ends this session.
        token.sessionVersion = (user as { sessionVersion?: number }).sessionVersion ?? 0;
      }
      const switchTo = trigger === "update" ? switchGroupInputSchema.safeParse(session) : null;
      if (switchTo?.success) {
        // Switching groups: only to a group the person really belongs to.
        const actor = await loadActor(String(token.userId), switchTo.data.groupId);
        if (actor) token.groupId = actor.group.id;
      }
      return token;
    },
    async session({ session, token }) {
      session.userId = String(token.userId ?? "");
      session.groupId = (token.groupId as string | null) ?? null;
      return session;
    },
  },
};
