import type { Metadata } from "next";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { requirePageRole } from "@/lib/auth/session";
import { listOutbox } from "@/lib/mail/outbox";
import { listCapturedMail } from "@/lib/mail/captured";
import { formatter } from "@/lib/format";
import { groupLook } from "@/lib/format/group-look-queries";
import { noun } from "@/lib/plural";

export const metadata: Metadata = { title: "Sent mail" };

export default async function SentMailPage() {
  const actor = await requirePageRole("/mail", "organiser");
  const [outbox, captured, look] = await Promise.all([listOutbox(actor.group.id), listCapturedMail(actor.group.id), groupLook(actor.group.id)]);
  const f = formatter(look);
  const waiting = outbox.filter((m) => m.status !== "sent");
  return (
    <main className="flex flex-col gap-6">
      <h1 className="text-3xl">Sent mail</h1>
      <p className="text-ink-soft">
        Every e-mail Cantrove sent for {actor.group.name}, as the mail service received it. On this installation the
        mail service is a local capture: nothing leaves the machine.
      </p>
      {waiting.length > 0 ? (
        <Notice tone="caution" title={`${f.count(waiting.length, noun("message"))} not delivered yet`}>
          <ul className="list-disc pl-5">
            {waiting.map((m) => (
              <li key={m.id}>
                {m.subject} → {m.to}: {m.status === "failed" ? "gave up" : "will retry"} after {f.count(m.attempts, "attempt")}
              </li>
            ))}
          </ul>
        </Notice>
      ) : null}
      {captured === null ? (
        <Notice tone="caution" title="The mail service is not answering">
          Messages are kept and retried; reload this page in a minute to see what arrived.
        </Notice>
      ) : captured.length === 0 ? (
        <EmptyState title="No mail yet">Invitations, pledge confirmations and full-bin alerts show up here.</EmptyState>
      ) : (
        <div className="flex flex-col gap-3">
          {captured.map((m) => (
            <Card key={m.id}>
              <details>
                <summary className="min-h-11 cursor-pointer py-2.5">
                  <span className="font-semibold">{m.subject}</span>{" "}
                  <span className="text-ink-faint">
                    to {m.to.join(", ")} · {f.moment(m.receivedAt)}
                  </span>
                </summary>
                <pre className="mt-3 whitespace-pre-wrap break-words font-sans text-ink-soft">{m.text}</pre>
              </details>
            </Card>
          ))}
        </div>
      )}
    </main>
  );
}
