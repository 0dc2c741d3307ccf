import type { Metadata } from "next";
import { Card } from "@/components/ui/card";
import { LeaveGroup } from "@/components/account/leave-group";
import { NotificationForm } from "@/components/account/notification-form";
import { requirePageRole } from "@/lib/auth/session";
import { organiserCount } from "@/lib/accounts/leaving";
import { notificationSettings } from "@/lib/notify/settings-queries";

export const metadata: Metadata = { title: "My settings" };

// Every member's own page: which e-mails they get, and leaving the group.
export default async function AccountPage() {
  const actor = await requirePageRole("/account");
  const [settings, organisers] = await Promise.all([notificationSettings(actor.user.id), organiserCount(actor.group.id)]);
  return (
    <main className="flex flex-col gap-6">
      <h1 className="text-3xl">My settings</h1>
      <p className="text-ink-soft">
        Signed in as <span className="font-semibold text-ink">{actor.user.email}</span>.
      </p>
      <Card title="E-mail notifications">
        <p className="mb-3 text-sm text-ink-soft">These apply in every group you belong to. Each e-mail also has a link that switches its kind off.</p>
        <NotificationForm settings={settings} />
      </Card>
      <Card title={`Leave ${actor.group.name}`}>
        <LeaveGroup groupName={actor.group.name} onlyOrganiser={actor.role === "organiser" && organisers <= 1} />
      </Card>
    </main>
  );
}
