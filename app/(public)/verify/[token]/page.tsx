import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { AppError } from "@/lib/api/errors";
import { tokenSchema } from "@/lib/accounts/schemas";
import { proveEmail } from "@/lib/accounts/verification";

export const metadata: Metadata = { title: "Confirm your e-mail", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

// Opening the mailed link is the proof, so the page proves the address as it renders.
async function confirm(token: string): Promise<{ email: string } | { problem: string }> {
  if (!tokenSchema.safeParse(token).success) return { problem: "This link is incomplete. Copy the whole link from the e-mail." };
  try {
    return { email: await proveEmail(token) };
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") return { problem: error.message };
    throw error;
  }
}

export default async function VerifyPage({ params }: { params: Promise<{ token: string }> }) {
  const result = await confirm((await params).token);
  return (
    <main id="main" className="mx-auto max-w-md px-4 py-10">
      <h1 className="text-3xl">Confirm your e-mail</h1>
      <Card className="mt-6">
        {"email" in result ? (
          <>
            <Notice tone="good" title="Your address is confirmed">
              <span className="break-all">{result.email}</span> is yours. Sign in with the password you chose.
            </Notice>
            <p className="mt-4">
              <Link className="font-semibold" href={`/signin?email=${encodeURIComponent(result.email)}`}>
                Sign in
              </Link>
            </p>
          </>
        ) : (
          <>
            <Notice tone="caution" title="This link does not work">
              {result.problem}
            </Notice>
            <p className="mt-4 text-sm">
              To get a new link, try to <Link href="/signin">sign in</Link>: the form offers to send one.
            </p>
          </>
        )}
      </Card>
    </main>
  );
}
