import Link from "next/link";
import { Brand } from "./brand";

export function PublicHeader() {
  return (
    <header className="no-print border-b border-paper-edge bg-paper">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-3 px-4 py-3">
        <Brand />
        <nav aria-label="Main" className="flex flex-wrap items-center gap-4 font-semibold">
          <Link href="/plan">Plan a heater</Link>
          {/* Not prefetched: the sign-in page is static, so a prefetch would
              download its form's code on every public page, drive pages
              included, for the few visitors who sign in. */}
          <Link href="/signin" prefetch={false}>
            Sign in
          </Link>
        </nav>
      </div>
    </header>
  );
}

export function PublicFooter() {
  return (
    <footer className="no-print mt-16 border-t border-paper-edge">
      <div className="mx-auto max-w-5xl px-4 py-6 text-sm text-ink-faint">
        Cantrove helps community groups collect cans for home-built solar air heaters. Heat figures are estimates;
        wiring and wall openings follow your local codes and licensed trades.
      </div>
    </footer>
  );
}
