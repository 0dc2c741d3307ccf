export function DatabaseDown() {
  return (
    <main id="main" className="mx-auto max-w-xl px-4 py-16">
      <div role="alert" className="rounded-card border-l-8 border-alarm bg-alarm-soft p-6">
        <h1 className="text-2xl">We can&apos;t reach the database</h1>
        <p className="mt-2 text-ink-soft">
          Cantrove is running, but its database is not answering right now, so nothing can be shown or saved. Nothing
          you entered earlier is lost. Wait a minute and reload; if it lasts, tell whoever runs your group&apos;s Cantrove.
        </p>
        <a href="" className="mt-4 inline-block font-semibold">
          Try again
        </a>
      </div>
    </main>
  );
}
