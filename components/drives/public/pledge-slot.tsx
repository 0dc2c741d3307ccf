"use client";

import { lazy, memo, Suspense, useEffect, useRef } from "react";
import { LoadBoundary } from "@/components/ui/load-boundary";
import { LIVE, pledgeCodeWanted, WAITING, wantPledgeCode } from "./pledge-gate";

// The pledge form sits below the map and the list. The server renders it in
// full, so it can be read, found and filled at once; its code (form state, the
// mutation, field errors) is fetched only when the form comes near the screen
// or someone touches it, and React then hydrates the server's markup in place.
// The inputs are uncontrolled, so whatever was typed before stays.
const PledgeForm = lazy(() =>
  pledgeCodeWanted.then(() => import("./pledge-form")).then((m) => ({ default: m.PledgeForm })),
);

export type PledgeChoice = { id: string; name: string };

// memo: a re-render of the live page (refetches, a marker tapped) must not
// reach the boundary while it waits for its code, or React would drop the
// server's markup and render the fallback instead.
export const PledgeSlot = memo(function PledgeSlot({ slug, points }: { slug: string; points: PledgeChoice[] }) {
  const ref = useRef<HTMLDivElement>(null);
  const firstPoints = useRef(points);

  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const want = () => wantPledgeCode();
    // A submit before the code arrived would reload the page with the answers
    // in its address: hold it, fetch the code, and let the form send it.
    const hold = (e: Event) => {
      const form = e.target as HTMLFormElement;
      if (form.dataset[LIVE]) return;
      e.preventDefault();
      form.dataset[WAITING] = "true";
      want();
    };
    el.addEventListener("focusin", want);
    el.addEventListener("pointerdown", want);
    el.addEventListener("submit", hold, true);
    const near = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && want(), { rootMargin: "400px 0px" });
    near.observe(el);
    return () => {
      el.removeEventListener("focusin", want);
      el.removeEventListener("pointerdown", want);
      el.removeEventListener("submit", hold, true);
      near.disconnect();
    };
  }, []);

  // New drop points while the form still waits: the boundary renders afresh, so get the code now.
  useEffect(() => {
    if (points !== firstPoints.current) wantPledgeCode();
  }, [points]);

  return (
    <div ref={ref}>
      <LoadBoundary what="pledge form">
        <Suspense fallback={<p role="status" className="text-ink-faint">Opening the pledge form…</p>}>
          <PledgeForm slug={slug} points={points} />
        </Suspense>
      </LoadBoundary>
    </div>
  );
});
