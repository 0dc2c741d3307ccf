import type { Metadata } from "next";
import { Suspense } from "react";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Sign in" };

export default function SignInPage() {
  return (
    <main id="main" className="mx-auto max-w-md px-4 py-10">
      <h1 className="text-3xl">Sign in</h1>
      <p className="mt-2 text-ink-soft">For organisers, volunteers and builders of a group. Donors need no account.</p>
      <Card className="mt-6">
        <Suspense>
          <SignInForm />
        </Suspense>
      </Card>
    </main>
  );
}
