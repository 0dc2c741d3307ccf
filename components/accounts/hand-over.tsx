"use client";

import { useQuery } from "@tanstack/react-query";
import { forgetThisPhone } from "@/lib/offline/forget";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { signOutTo } from "@/components/auth/session-client";
import { Button } from "@/components/ui/button";
import { FormError, RadioGroup, SelectField } from "@/components/ui/field";
import { ROLE_HOME, ROLE_LABEL } from "@/lib/auth/roles";
import { memberQueries, useHandOver } from "@/hooks/queries/members";
import { ListSkeleton } from "./invitation-list";

type Then = "volunteer" | "builder" | "leave";
const THEN_CHOICES: { value: Then; label: string }[] = [
  { value: "volunteer", label: "Stay as a volunteer" },
  { value: "builder", label: "Stay as a builder" },
  { value: "leave", label: "Leave the group (you are signed out)" },
];

/** An organiser gives the organiser role to another member, then steps down or leaves. */
export function HandOver({ currentUserId }: { currentUserId: string }) {
  const { data, isPending } = useQuery(memberQueries.list());
  const handOver = useHandOver();
  const router = useRouter();
  const [to, setTo] = useState("");
  const [then, setThen] = useState<Then>("volunteer");
  const [asking, setAsking] = useState(false);
  const [missing, setMissing] = useState<string | undefined>();
  if (isPending) return <ListSkeleton />;
  const others = (data ?? []).filter((m) => m.userId !== currentUserId);
  if (!others.length) return <p className="text-ink-soft">Invite someone first: there is nobody else in the group to hand over to.</p>;
  const chosen = others.find((m) => m.userId === to);

  const confirm = () =>
    handOver.mutate(
      { userId: to, then },
      {
        onSuccess: () => {
          if (then === "leave") void forgetThisPhone().then(() => signOutTo("/signin"));
          else router.push(ROLE_HOME[then]);
        },
        onSettled: () => setAsking(false),
      },
    );

  return (
    <div className="flex flex-col gap-3">
      <FormError message={handOver.error?.message ?? null} />
      <SelectField
        id="hand-over-to"
        label="New organiser"
        placeholder="Choose a member…"
        value={to}
        error={missing}
        onChange={(e) => {
          setTo(e.target.value);
          setMissing(undefined);
          setAsking(false);
        }}
        options={others.map((m) => ({ value: m.userId, label: `${m.name} (${ROLE_LABEL[m.role]})` }))}
      />
      <RadioGroup id="hand-over-then" name="then" label="Then you" options={THEN_CHOICES} value={then} onChange={(v) => setThen(v as Then)} />
      {asking && chosen ? (
        <div className="flex flex-col gap-2">
          <p className="font-semibold">
            {chosen.name} becomes organiser; you {then === "leave" ? "leave the group" : `become a ${ROLE_LABEL[then].toLowerCase()}`}.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button variant="danger" disabled={handOver.isPending} onClick={confirm}>
              {handOver.isPending ? "Handing over…" : `Hand over to ${chosen.name.split(" ")[0]}`}
            </Button>
            <Button variant="secondary" onClick={() => setAsking(false)}>
              Not now
            </Button>
          </div>
        </div>
      ) : (
        <div>
          <Button variant="secondary" onClick={() => (to ? setAsking(true) : setMissing("Choose who takes over."))}>
            Hand over…
          </Button>
        </div>
      )}
    </div>
  );
}
