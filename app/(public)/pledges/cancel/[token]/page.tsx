import type { Metadata } from "next";
import Link from "next/link";
import { PledgeCancelForm } from "@/components/drives/pledge-cancel-form";
import { Card } from "@/components/ui/card";
import { formatter, DEFAULT_LOOK } from "@/lib/format";
import { pledgeByToken } from "@/lib/drives/pledge-life";
import { PLEDGE_STATUS_LABEL } from "@/lib/drives/schemas";

export const metadata: Metadata = { title: "Cancel a pledge", referrer: "no-referrer", robots: { index: false } };
export const dynamic = "force-dynamic";

// Opened from the pledge confirmation mail. Opening it (a GET, which mail
// scanners also do) changes nothing; the form below cancels with a POST.
export default async function CancelPledgePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const pledge = /^[A-Za-z0-9_-]{43}$/.test(token) ? await pledgeByToken(token) : undefined;
  const show = formatter(DEFAULT_LOOK);
  return (
    <main id="main" className="mx-auto max-w-md px-4 py-10">
      <h1 className="text-3xl">Cancel a pledge</h1>
      <Card className="mt-6">
        {!pledge ? (
          <p>This link names no pledge. Open it again from the confirmation e-mail, or write to the drive&apos;s organisers.</p>
        ) : (
          <div className="flex flex-col gap-3">
            <p>
              You pledged about {show.count(pledge.bags, "bag")} of cans for {pledge.pointName} on {show.longDay(pledge.bringOn)}, for the{" "}
              <Link href={`/drives/${pledge.driveSlug}`}>{pledge.driveName}</Link>.
            </p>
            {pledge.status === "pledged" ? (
              <>
                <p>Cancel it, so the organisers do not wait for your bags?</p>
                <PledgeCancelForm token={token} />
              </>
            ) : (
              <p className="font-semibold">This pledge is: {PLEDGE_STATUS_LABEL[pledge.status]}.</p>
            )}
          </div>
        )}
      </Card>
    </main>
  );
}
