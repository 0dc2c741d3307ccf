import type { Metadata } from "next";
import Link from "next/link";
import { SignUpForm } from "@/components/accounts/sign-up-form";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Start a group" };

export default function SignUpPage() {
  return (
    <main id="main" className="mx-auto max-w-md px-4 py-10">
      <h1 className="text-3xl">Start a group</h1>
      <p className="mt-2 text-ink-soft">
        You become its organiser and can invite volunteers and builders. Joining an existing group? Use the link in your invitation
        e-mail instead.
      </p>
      <Card className="mt-6">
        <SignUpForm />
      </Card>
      <p className="mt-4">
        Already have an account? <Link href="/signin">Sign in</Link>
      </p>
    </main>
  );
}
