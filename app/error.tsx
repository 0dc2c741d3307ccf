"use client";

import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { ApiError, fetchJson } from "@/lib/api/client";

// Production hides the real error from the browser, so ask the health
// endpoint whether the database is the cause and say so plainly.
export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  const [dbDown, setDbDown] = useState(false);
  useEffect(() => {
    fetchJson("/api/health")
      .then(() => setDbDown(false))
      .catch((error: unknown) => setDbDown(error instanceof ApiError && error.status === 503));
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
