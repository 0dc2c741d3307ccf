import { MAIL_API_URL } from "./env";

export interface CapturedMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  headers: Record<string, string>;
}

export async function mailTo(address: string): Promise<CapturedMail[]> {
  const res = await fetch(`${MAIL_API_URL}/messages?to=${encodeURIComponent(address)}`);
  return (await res.json()) as CapturedMail[];
}

/** Polls the mail fake until a message for the address matches, or fails after the timeout. */
export async function waitForMail(address: string, match: (m: CapturedMail) => boolean = () => true, timeoutMs = 10_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await mailTo(address)).find(match);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no matching mail for ${address} within ${timeoutMs} ms`);
}
