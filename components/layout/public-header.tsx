import { Brand } from "./brand";

// Plain links: a visitor's first page (often a drive page opened from a QR
// code on a bin) then loads no client-router link code (~3 kB compressed) and
// prefetches nothing. Going on to another page is an ordinary page load.
export function PublicHeader() {
  return (
    <header className="no-print border-b border-paper-edge bg-paper">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-3 px-4 py-3">
        <Brand />
        <nav aria-label="Main" className="flex flex-wrap items-center gap-4 font-semibold">
          <a href="/plan" className="tap">Plan a heater</a>
          <a href="/signin" className="tap">Sign in</a>
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
