"use client";

import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";

// Production hides the real error from the browser, so ask the health
// endpoint whether the database is the cause and say so plainly.
export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  const [dbDown, setDbDown] = useState(false);
  useEffect(() => {
    fetch("/api/health", { cache: "no-store" })
      .then((r) => setDbDown(r.status === 503))
      .catch(() => setDbDown(false));
  }, []);
  return (
    <main id="main" className="mx-auto max-w-xl px-4 py-16">
      <div role="alert" className="rounded-card border-l-8 border-alarm bg-alarm-soft p-6">
        <h1 className="text-2xl">{dbDown ? "We can't reach the database" : "This page could not be shown"}</h1>
        <p className="mt-2 text-ink-soft">
          {dbDown
            ? "Cantrove is running, but its database is not answering, so nothing can be shown or saved right now. Try again in a minute."
            : "Something went wrong while loading this page. Try again; if it keeps happening, tell your group's organiser."}
        </p>
        <Button className="mt-4" onClick={() => reset()}>
          Try again
        </Button>
      </div>
    </main>
  );
}
