import type { Metadata } from "next";
import { ResetForm } from "@/components/accounts/reset-form";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Choose a new password", referrer: "no-referrer" };

export default async function ResetPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <main id="main" className="mx-auto max-w-md px-4 py-10">
      <h1 className="text-3xl">Choose a new password</h1>
      <p className="mt-2 text-ink-soft">The link works once. After saving, sign in with the new password.</p>
      <Card className="mt-6">
        <ResetForm token={token} />
      </Card>
    </main>
  );
}
