"use client";

import { useQueryClient } from "@tanstack/react-query";
import { Serwist } from "@serwist/window";
import { usePathname } from "next/navigation";
import { useEffect, useMemo, useState, useSyncExternalStore } from "react";
import { Button } from "@/components/ui/button";
import { useFormat } from "@/hooks/use-look";
import { PersonProvider } from "./person-context";

// Signed-in pages only (app/(app)/layout.tsx): registers the service worker
// (app/sw.ts), tells it who is signed in so it keeps their pages, runs and
// map tiles for a cold start with no signal, shows "Offline — last updated"
// and offers the reload when a new version has been installed. The public
// pages never load this file, so their JavaScript stays within budget.

export const SW_URL = "/serwist/sw.js";
/** How often an open app asks whether a new version was deployed (the browser also asks on every visit). */
const UPDATE_CHECK_MS = 30 * 60_000;

interface Props {
  personId: string;
  groupId: string;
  home: string;
  renderedAt: string;
  tileUrl: string;
  children: React.ReactNode;
}

function subscribeOnline(onChange: () => void) {
  window.addEventListener("online", onChange);
  window.addEventListener("offline", onChange);
  return () => {
    window.removeEventListener("online", onChange);
    window.removeEventListener("offline", onChange);
  };
}

/** false with no signal; true on the server (the page was just rendered, so it was online). */
export function useOnline(): boolean {
  return useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);
}

async function hello(personId: string, groupId: string, home: string, tileUrl: string) {
  const reg = await navigator.serviceWorker.ready;
  reg.active?.postMessage({ type: "CANTROVE_PERSON", person: { id: personId, group: groupId, home }, tileUrl });
}

/** The page's side of the worker (Serwist's window module), registered once per page load. */
function useSerwist(): Serwist | null {
  const [serwist, setSerwist] = useState<Serwist | null>(null);
  useEffect(() => {
    if (!("serviceWorker" in navigator)) return;
    const w = window as Window & { cantroveSerwist?: Serwist };
    w.cantroveSerwist ??= new Serwist(SW_URL, { scope: "/", type: "module" });
    void w.cantroveSerwist.register().catch(() => undefined);
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the worker exists only in the browser, once mounted
    setSerwist(w.cantroveSerwist);
  }, []);
  return serwist;
}

function Keeper({ personId, groupId, home, renderedAt, tileUrl }: Omit<Props, "children">) {
  const serwist = useSerwist();
  const client = useQueryClient();
  const online = useOnline();
  const pathname = usePathname();
  const f = useFormat();
  const [updateReady, setUpdateReady] = useState(false);

  useEffect(() => {
    if (!serwist || !("serviceWorker" in navigator)) return;
    const waiting = () => setUpdateReady(true);
    serwist.addEventListener("waiting", waiting);
    // The first time a worker takes this page (clientsClaim, moments after it installs), what the
    // page read before then is read again through it, so those answers are kept too.
    const hadController = navigator.serviceWorker.controller !== null;
    void hello(personId, groupId, home, tileUrl)
      .then(async () => {
        if (hadController) return;
        for (let i = 0; i < 50 && !navigator.serviceWorker.controller; i++) await new Promise((r) => setTimeout(r, 100));
        if (navigator.serviceWorker.controller) await client.refetchQueries({ type: "active" });
      })
      .catch(() => undefined);
    const check = () => {
      if (navigator.onLine) void serwist.update().catch(() => undefined);
    };
    const timer = setInterval(check, UPDATE_CHECK_MS);
    window.addEventListener("online", check);
    // A worker already waiting when this page opened (installed during an earlier visit).
    void navigator.serviceWorker.getRegistration().then((reg) => {
      if (reg?.waiting && reg.active) setUpdateReady(true);
    });
    return () => {
      serwist.removeEventListener("waiting", waiting);
      clearInterval(timer);
      window.removeEventListener("online", check);
    };
  }, [serwist, client, personId, groupId, home, tileUrl]);

  // A page reached inside the app (no full load) is kept too, when online.
  useEffect(() => {
    if (!navigator.onLine || !("serviceWorker" in navigator)) return;
    void navigator.serviceWorker.ready.then((reg) => reg.active?.postMessage({ type: "CANTROVE_KEEP", path: pathname }));
  }, [pathname]);

  const sameDay = new Date(renderedAt).toDateString() === new Date().toDateString();
  return (
    <>
      {online ? null : (
        <p role="status" data-testid="offline-notice" className="bg-ink px-4 py-2 text-center font-semibold text-paper">
          Offline — last updated {sameDay ? f.time(renderedAt) : f.moment(renderedAt)}. Entries are kept on this phone.
        </p>
      )}
      {updateReady ? (
        <div role="alert" data-testid="update-prompt" className="flex flex-wrap items-center justify-center gap-3 bg-ember px-4 py-2 text-white">
          <span className="font-semibold">New version of Cantrove — reload to use it.</span>
          <Button
            type="button"
            variant="secondary"
            onClick={() => {
              if (!serwist) return location.reload();
              serwist.addEventListener("controlling", () => location.reload());
              serwist.messageSkipWaiting();
            }}
          >
            Reload
          </Button>
        </div>
      ) : null}
    </>
  );
}

export function OfflineKeeper({ children, ...props }: Props) {
  const person = useMemo(() => ({ id: props.personId, group: props.groupId }), [props.personId, props.groupId]);
  return (
    <PersonProvider value={person}>
      <Keeper {...props} />
      {children}
    </PersonProvider>
  );
}
