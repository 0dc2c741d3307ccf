import Link from "next/link";
import type { ComponentProps } from "react";
import { Brand } from "./brand";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { GroupSwitcher } from "@/components/accounts/group-switcher";
import { SearchBox } from "@/components/search/search-box";
import { ROLE_LABEL, type Role } from "@/lib/auth/roles";

const NAV: Record<Role, { href: string; label: string }[]> = {
  organiser: [
    { href: "/dashboard", label: "Dashboard" },
    { href: "/organise/drives", label: "Drives" },
    { href: "/runs", label: "Pickup runs" },
    { href: "/ledger", label: "Ledger" },
    { href: "/log", label: "Log" },
    { href: "/units", label: "Heater units" },
    { href: "/members", label: "Members" },
    { href: "/mail", label: "Sent mail" },
    { href: "/plan", label: "Planner" },
    { href: "/organise/group", label: "Group settings" },
    { href: "/account", label: "My settings" },
  ],
  volunteer: [
    { href: "/log", label: "Log" },
    { href: "/runs", label: "My runs" },
    { href: "/plan", label: "Planner" },
    { href: "/account", label: "My settings" },
  ],
  builder: [
    { href: "/units", label: "My units" },
    { href: "/plan", label: "Planner" },
    { href: "/account", label: "My settings" },
  ],
};

// The header's links fetch their page when tapped (or hovered), not all at once while the page
// loads: prefetching every section cost a phone ≈250 ms of main thread (at a 4× slower CPU) and
// the data of pages it may never open.
function HeaderLink(props: ComponentProps<typeof Link>) {
  return <Link prefetch={false} {...props} />;
}

export function AppHeader({ groupName, role, userName }: { groupName: string; role: Role; userName: string }) {
  return (
    <header className="no-print border-b border-paper-edge bg-paper">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-3 px-4 py-3">
        <Brand link={HeaderLink} />
        <div className="text-sm text-ink-soft">
          <span className="font-semibold text-ink">{groupName}</span> · {ROLE_LABEL[role]} · {userName}
        </div>
        {/* Organisers search everything of their group; the others' pages are few enough to need none. */}
        {role === "organiser" ? <SearchBox /> : null}
      </div>
      <nav aria-label="Group" className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-4 px-4 pb-2 font-semibold">
        {NAV[role].map((item) => (
          // At least 44 px tall: a finger, not a mouse pointer, is the usual way in on a phone.
          <HeaderLink key={item.href} href={item.href} className="tap justify-center">
            {item.label}
          </HeaderLink>
        ))}
        {/* Never squeezed to its narrowest (each word on its own line) and widened later: that moved the page. */}
        <span className="ml-auto flex shrink-0 flex-wrap items-center gap-3 whitespace-nowrap">
          <GroupSwitcher />
          <SignOutButton />
        </span>
      </nav>
    </header>
  );
}
