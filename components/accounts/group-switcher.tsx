"use client";

import { SelectBox } from "@/components/ui/field";
import { useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { updateSession } from "@/components/auth/session-client";
import { ROLE_HOME, ROLE_LABEL } from "@/lib/auth/roles";
import { memberQueries, useGroupSwitched } from "@/hooks/queries/members";

/** Shown only to people in more than one group; switching lands on that group's home for their role there. */
export function GroupSwitcher() {
  const { data } = useQuery(memberQueries.myGroups());
  const router = useRouter();
  const refreshAll = useGroupSwitched();
  const [pending, setPending] = useState(false);
  if (!data || data.length < 2) return null;
  const active = data.find((g) => g.active);

  async function onChange(groupId: string) {
    const target = data!.find((g) => g.id === groupId);
    if (!target) return;
    setPending(true);
    await updateSession({ groupId });
    await refreshAll();
    router.push(ROLE_HOME[target.role]);
    router.refresh();
    setPending(false);
  }

  return (
    <span className="flex items-center gap-2 text-sm">
      <label htmlFor="group-switcher" className="text-ink-soft">
        Active group
      </label>
      <SelectBox
        id="group-switcher"
        value={active?.id}
        disabled={pending}
        onChange={(e) => onChange(e.target.value)}
        className="max-w-[14rem] text-sm"
        options={data.map((g) => ({ value: g.id, label: `${g.name} (${ROLE_LABEL[g.role].toLowerCase()})` }))}
      />
    </span>
  );
}
