// A plain link: this boundary is part of every page's tree, so a next/link
// here would add the link code (~3 kB compressed) to pages that have no other
// use for it, the public drive page among them.
export default function NotFound() {
  return (
    <main id="main" className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-3xl">Nothing here</h1>
      <p className="mt-2 text-ink-soft">That page does not exist, or it belongs to a group you are not part of.</p>
      <p className="mt-4">
        {/* eslint-disable-next-line @next/next/no-html-link-for-pages -- see above: a plain link on purpose */}
        <a href="/">Back to the start</a>
      </p>
    </main>
  );
}
