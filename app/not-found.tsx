import Link from "next/link";

export default function NotFound() {
  return (
    <main id="main" className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-3xl">Nothing here</h1>
      <p className="mt-2 text-ink-soft">That page does not exist, or it belongs to a group you are not part of.</p>
      <p className="mt-4">
        <Link href="/">Back to the start</Link>
      </p>
    </main>
  );
}
