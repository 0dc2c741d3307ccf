import type { Metadata } from "next";
import Link from "next/link";
import { ForgotForm } from "@/components/accounts/forgot-form";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Forgot password" };

export default function ForgotPage() {
  return (
    <main id="main" className="mx-auto max-w-md px-4 py-10">
      <h1 className="text-3xl">Forgot your password?</h1>
      <p className="mt-2 text-ink-soft">Enter the e-mail you sign in with and we will send a link to choose a new password.</p>
      <Card className="mt-6">
        <ForgotForm />
      </Card>
      <p className="mt-4">
        <Link href="/signin" className="tap">Back to sign in</Link>
      </p>
    </main>
  );
}
