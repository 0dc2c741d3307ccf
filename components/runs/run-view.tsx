"use client";

import { useQuery } from "@tanstack/react-query";
import { runQueries } from "@/hooks/queries/runs";
import { Notice } from "@/components/ui/notice";
import type { RunDetail, RunStop } from "@/lib/runs/types";
import { RunStateBadge } from "./run-list";
import { RouteMap } from "./route-map";
import { StopActions } from "./stop-actions";
import { UndoStopHaul, UnskipStop } from "./stop-undo";
import { useFormat } from "@/hooks/use-look";
import { useOutbox, type Refusal } from "@/components/ledger/use-outbox";
import { RefusalFix } from "@/components/ledger/refusal-fix";
import { Button } from "@/components/ui/button";
import type { QueuedEntry } from "@/lib/offline/store";
import { describeOpeningHours } from "@/lib/drives/opening-hours";
import { CLOSED_RUN_STATES } from "@/lib/runs/schemas";
import { RunEditor, type DriverChoice } from "./run-editor";

type Outbox = ReturnType<typeof useOutbox>;

/** What waits on this phone for one stop: "waiting" until the server confirms, or the server's refusal with a way to drop it. */
function StopQueue({ waiting, refused, outbox }: { waiting: QueuedEntry[]; refused: Refusal[]; outbox: Outbox }) {
  const f = useFormat();
  if (!waiting.length && !refused.length) return null;
  return (
    <div className="mt-3 flex flex-col gap-2" data-testid="stop-queue">
      {waiting.map((e) => (
        <p key={e.key} data-testid="waiting-entry" className="rounded-lg border-2 border-dashed border-ink/40 bg-paper-deep px-3 py-2">
          <span className="font-semibold">Waiting to be sent:</span> {e.label} <span className="text-sm text-ink-soft">(entered {f.time(e.createdAt)})</span>
        </p>
      ))}
      {refused.map((r) =>
        r.question ? (
          <div key={r.key} role="alertdialog" aria-label="Check this number" className="rounded-lg border-2 border-sun bg-sun-soft px-3 py-2">
            <p className="font-semibold">Not recorded yet: {r.label}</p>
            <p>Really? {r.question}</p>
            <div className="mt-1 flex flex-wrap gap-2">
              <Button type="button" onClick={() => outbox.confirmRefusal(r.key)}>Yes, record it</Button>
              <Button type="button" variant="quiet" onClick={() => outbox.dismissRefusal(r.key)}>No, drop it</Button>
            </div>
          </div>
        ) : (
          <div key={r.key} role="alert" className="rounded-lg border-2 border-alarm bg-alarm-soft px-3 py-2">
            <p className="font-semibold text-alarm">Not recorded: {r.label}</p>
            <p>The server said: {r.message}</p>
            <div className="mt-1 flex flex-wrap gap-2">
              <RefusalFix refusal={r} onFix={outbox.fixRefusal} />
              <Button type="button" variant="quiet" onClick={() => outbox.dismissRefusal(r.key)}>Drop it</Button>
            </div>
          </div>
        ),
      )}
    </div>
  );
}

function StopCard({ run, stop, canAct, isNext, outbox }: { run: RunDetail; stop: RunStop; canAct: boolean; isNext: boolean; outbox: Outbox }) {
  const waiting = outbox.items.filter((e) => e.stopId === stop.id);
  const refused = outbox.refusals.filter((r) => (r.item as QueuedEntry).stopId === stop.id);
  const p = stop.dropPoint;
  const f = useFormat();
  return (
    <li
      className={`rounded-card border-2 bg-white p-4 ${isNext ? "border-ember" : "border-paper-edge"}`}
      aria-label={`Stop ${stop.position}: ${p.name}`}
      data-status={stop.status}
    >
      <div className="flex items-start justify-between gap-2">
        <h2 className="text-xl">
          <span className="mr-2 inline-flex h-8 w-8 items-center justify-center rounded-full bg-ember text-base text-white">{stop.position}</span>
          {p.name}
        </h2>
        <span className="text-sm text-ink-faint">+{f.distance(stop.legKm)}</span>
      </div>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-base">
        <dt className="font-semibold">Where</dt>
        <dd>{p.address || "—"}</dd>
        <dt className="font-semibold">Hours</dt>
        <dd>
          {describeOpeningHours(p.openingHours) || (p.hours ? null : "—")}
          {p.openingHours.length && p.hours ? <br /> : null}
          {p.hours ? <span className="text-ink-soft">{p.hours}</span> : null}
          {stop.openOnRunDay === false && stop.status === "pending" ? (
            <span className="mt-1 block font-semibold text-alarm">Closed on the run&apos;s day by these hours</span>
          ) : null}
        </dd>
        <dt className="font-semibold">Access</dt>
        <dd>{p.accessNotes || "No access notes."}</dd>
        <dt className="font-semibold">Host</dt>
        <dd>
          {p.hostName ?? "—"}
          {p.hostPhone ? <> · <a className="tap" href={`tel:${p.hostPhone.replace(/\s+/g, "")}`}>{p.hostPhone}</a></> : null}
          {p.hostEmail ? <> · <a className="tap" href={`mailto:${p.hostEmail}`}>{p.hostEmail}</a></> : null}
        </dd>
      </dl>
      <div className="mt-3">
        {stop.status === "logged" ? (
          <>
            <p className="font-semibold text-moss-deep">
              Haul logged ✓
              {stop.haul ? (
                <span className="font-normal text-ink-soft">
                  {" "}
                  — {f.count(stop.haul.bags, "bag")}
                  {stop.haul.weightKg !== null ? `, ${f.mass(stop.haul.weightKg)}` : ""}, about {f.count(stop.haul.estimatedCans, "can")} (estimate)
                </span>
              ) : null}
            </p>
            {canAct && stop.haul ? <UndoStopHaul movementId={stop.haul.movementId} dropPointName={p.name} /> : null}
          </>
        ) : stop.status === "released" ? (
          <p className="font-semibold text-ink-soft">Released — the run was cancelled before this stop.</p>
        ) : stop.status === "skipped" ? (
          <>
            <p className="font-semibold text-ink-soft">Skipped — “{stop.skipReason}”</p>
            {canAct ? <UnskipStop runId={run.id} stopId={stop.id} dropPointName={p.name} /> : null}
          </>
        ) : canAct && waiting.length > 0 ? null : canAct ? (
          <StopActions runId={run.id} stopId={stop.id} dropPointName={p.name} plannedOn={run.plannedOn} queue={outbox.submit} />
        ) : (
          <p className="text-ink-soft">Waiting for the volunteer.</p>
        )}
        <StopQueue waiting={waiting} refused={refused} outbox={outbox} />
      </div>
    </li>
  );
}

export function RunView({
  runId,
  canAct,
  canEdit = false,
  drivers = [],
  dropPoints = [],
  tileUrl,
  attribution,
}: {
  runId: string;
  canAct: boolean;
  /** An organiser of the run's group: may change and cancel it while it is open. */
  canEdit?: boolean;
  drivers?: DriverChoice[];
  dropPoints?: { id: string; name: string }[];
  tileUrl: string;
  attribution: string;
}) {
  // Starts from what the page prefetched (<Prefetched>); the stop actions' hooks put each answer in this read's cache, and read it again after an undo.
  const { data: run } = useQuery(runQueries.detail(runId));
  const f = useFormat();
  const outbox = useOutbox();
  if (!run) return null; // only before the page's prefetched run reaches the cache
  const next = run.stopList.find((s) => s.status === "pending");
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-3xl">Run on {f.day(run.plannedOn)}</h1>
        <RunStateBadge state={run.state} />
      </div>
      <p className="text-ink-soft" aria-live="polite" data-testid="run-progress">
        {run.driveName} · {run.assigneeName ?? "nobody assigned"} · {f.number(run.logged)} logged, {f.number(run.skipped)} skipped of {f.count(run.stops, "stop")} ·{" "}
        {f.distance(run.distanceKm)}
      </p>
      {run.state === "cancelled" ? (
        <Notice title="Run cancelled">
          {run.cancelledByName ? `${run.cancelledByName} cancelled this run` : "This run was cancelled"}
          {run.cancelledAt ? ` on ${f.dayOf(run.cancelledAt)}` : ""}: “{run.cancelReason}”. Hauls already logged stay in the records.
        </Notice>
      ) : run.state === "done" ? (
        <Notice tone="good" title="Run done">Every stop is logged or skipped. Thank you!</Notice>
      ) : (
        <Notice tone="caution" title="Before you lift a bag">
          Wear gloves: cans can have sharp edges. Sugary bins draw wasps; open bags slowly and away from your face.
        </Notice>
      )}
      {run.warnings.length ? (
        <Notice tone="caution" title="Check before you go">
          <ul className="list-disc pl-5" data-testid="run-warnings">
            {run.warnings.map((w, i) => (
              <li key={i}>{w.message}</li>
            ))}
          </ul>
          <p className="mt-1">This is a warning only: the run can go ahead.</p>
        </Notice>
      ) : null}
      {run.notes ? <Notice title="Notes from the organiser">{run.notes}</Notice> : null}
      <RouteMap
        start={run.start}
        stops={run.stopList.map((s) => ({ id: s.id, name: s.dropPoint.name, lat: s.dropPoint.lat, lng: s.dropPoint.lng, status: s.status }))}
        returnToStart={run.returnToStart}
        tileUrl={tileUrl}
        attribution={attribution}
        className="h-56 w-full rounded-card border border-paper-edge sm:h-80"
      />
      <ol className="flex flex-col gap-3">
        {run.stopList.map((s) => (
          <StopCard key={s.id} run={run} stop={s} canAct={canAct && run.state !== "cancelled"} isNext={s.id === next?.id} outbox={outbox} />
        ))}
      </ol>
      {canEdit && !CLOSED_RUN_STATES.includes(run.state) ? <RunEditor run={run} drivers={drivers} dropPoints={dropPoints} /> : null}
    </div>
  );
}
