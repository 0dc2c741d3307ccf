import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { UnsubscribeConfirm } from "@/components/notify/unsubscribe-confirm";
import { NOTIFICATION_TEXT } from "@/lib/notify/kinds";
import { readUnsubscribeToken } from "@/lib/notify/unsubscribe";

export const metadata: Metadata = { title: "Stop these e-mails", referrer: "no-referrer", robots: { index: false } };
export const dynamic = "force-dynamic";

// Opening the link only asks (RFC 8058 §3.2 leaves GET to a page; link scanners open links):
// the button switches the kind off. A mail provider's one-click POST goes to /api/unsubscribe/{token}.
export default async function UnsubscribePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = readUnsubscribeToken(token);
  return (
    <main id="main" className="mx-auto max-w-md px-4 py-10">
      <h1 className="text-3xl">Stop these e-mails</h1>
      <Card className="mt-6">
        {link ? (
          <div className="flex flex-col gap-3">
            <p>
              Switch off <span className="font-semibold">{NOTIFICATION_TEXT[link.kind].label}</span>?
            </p>
            <p className="text-sm text-ink-soft">{NOTIFICATION_TEXT[link.kind].hint}</p>
            <UnsubscribeConfirm token={token} label={NOTIFICATION_TEXT[link.kind].label} />
          </div>
        ) : (
          <Notice tone="caution" title="This link does not work">
            Copy the whole link from the e-mail, or sign in and change your e-mails under <Link href="/account">My settings</Link>.
          </Notice>
        )}
      </Card>
    </main>
  );
}
