"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { fetchJson } from "@/lib/api/client";
import { resendVerificationInputSchema } from "@/lib/accounts/schemas";

/** "Send the link again" for an address whose account waits for its confirmation link. */
export function ResendVerification({ email }: { email: string }) {
  const [answer, setAnswer] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const input = resendVerificationInputSchema.safeParse({ email });
  if (!input.success) return null;

  async function resend() {
    setPending(true);
    try {
      const res = await fetchJson<{ message: string }>("/api/verify-email/resend", { method: "POST", body: input.data });
      setAnswer(res.message);
    } catch {
      setAnswer("We could not send it just now. Try again in a minute.");
    } finally {
      setPending(false);
    }
  }

  return answer ? (
    <p className="text-sm" role="status">{answer}</p>
  ) : (
    <Button type="button" variant="secondary" onClick={resend} disabled={pending}>
      {pending ? "Sending…" : "Send the link again"}
    </Button>
  );
}
