import "server-only";
import { env } from "@/lib/env";

export interface CapturedMail {
  id: string;
  receivedAt: string;
  to: string[];
  subject: string;
  text: string;
}

/** The group's messages as the mail service captured them; null when it cannot be reached. */
export async function listCapturedMail(groupId: string): Promise<CapturedMail[] | null> {
  try {
    const res = await fetch(`${env().MAIL_API_URL}/messages?group=${encodeURIComponent(groupId)}`, {
      cache: "no-store",
      signal: AbortSignal.timeout(3_000),
    });
    if (!res.ok) return null;
    return (await res.json()) as CapturedMail[];
  } catch {
    return null;
  }
}
