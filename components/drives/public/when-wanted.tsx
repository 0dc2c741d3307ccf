"use client";

import { lazy, memo, Suspense, useEffect, useRef, type ComponentType } from "react";
import { LoadBoundary } from "@/components/ui/load-boundary";

// The public drive page's first load is held to 200 kB of compressed
// JavaScript (tests/e2e/drive-page-weight.test.ts), map included. Its forms
// are rendered in full by the server and post to server actions, so they
// work (and send) before their code arrives; that code is fetched only when
// the form is near the screen (`near`) or someone touches it, and React then
// hydrates the server's markup in place. A submit before that is an ordinary
// form post: nothing needs holding back.
export function whenWanted<P extends object>(what: string, load: () => Promise<ComponentType<P>>, near = false) {
  let open: () => void = () => undefined;
  // On the server the code is wanted at once, so the form is rendered in full.
  const wanted =
    typeof window === "undefined"
      ? Promise.resolve()
      : new Promise<void>((resolve) => {
          open = resolve;
        });
  const Code = lazy(() => wanted.then(load).then((component) => ({ default: component })));

  // memo: a re-render of the live page (a refetch every 30 s) must not reach the
  // boundary while it waits for its code, or React would drop the server's
  // markup and show the fallback instead. Pass primitives or stable values.
  return memo(function WhenWanted(props: P) {
    const ref = useRef<HTMLDivElement>(null);
    useEffect(() => {
      const el = ref.current;
      if (!el) return;
      const want = () => open();
      el.addEventListener("focusin", want);
      el.addEventListener("pointerdown", want);
      const watch = near ? new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && want(), { rootMargin: "400px 0px" }) : null;
      watch?.observe(el);
      return () => {
        el.removeEventListener("focusin", want);
        el.removeEventListener("pointerdown", want);
        watch?.disconnect();
      };
    }, []);
    return (
      <div ref={ref}>
        <LoadBoundary what={what}>
          <Suspense fallback={<p role="status" className="text-ink-faint">Opening the {what}…</p>}>
            <Code {...props} />
          </Suspense>
        </LoadBoundary>
      </div>
    );
  });
}
