"use client";

import { useFormat } from "@/hooks/use-look";
import { weightEntry } from "@/lib/format/weight-entry";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { ApiError, fieldErrors, unusualQuestion } from "@/lib/api/client";
import { useLogStopHaul, useSkipStop } from "@/hooks/queries/runs";
import { ConfirmUnusual } from "@/components/ledger/confirm-unusual";
import { NumberField } from "@/components/ui/number-field";
import { NUMBER_SPECS, parseNumberInputs } from "@/lib/forms/number-input";
import { Notice } from "@/components/ui/notice";
import { haulDayMismatch } from "@/lib/drives/opening-hours";
import { formatter } from "@/lib/format";
import { newKey } from "@/lib/api/idempotency-key";


/** The run's offline queue (components/ledger/use-outbox.ts): with no signal, a stop's haul or skip waits there. */
export type QueueEntry = (url: string, body: unknown, label: string, stopId?: string, key?: string) => Promise<unknown>;

interface Props {
  runId: string;
  stopId: string;
  dropPointName: string;
  queue?: QueueEntry;
  /** The run's day: logging on another day is allowed, with a warning. */
  plannedOn?: string;
}

const noSignal = (e: unknown) => !(e instanceof ApiError) || e.status === 0;

/** Log a haul at this stop (a ledger movement, then the stop points at it), or skip it with a reason. */
export function StopActions({ runId, stopId, dropPointName, queue, plannedOn }: Props) {
  const look = useFormat().look;
  const [mode, setMode] = useState<"idle" | "log" | "skip">("idle");
  const [bags, setBags] = useState("");
  const [weight, setWeight] = useState("");
  const weighed = weightEntry(useFormat().look.units); // typed in the group's units, sent in kg
  const [reason, setReason] = useState("");
  const [fields, setFields] = useState<Record<string, string>>({});
  const edit = (key: string, set: (raw: string) => void) => (raw: string) => {
    set(raw);
    setFields(({ [key]: _gone, ...rest }) => rest);
  };
  // A retry after a dropped connection reuses the key, so the haul is never logged twice;
  // once the server has answered (say, a 422), the corrected entry is a new request with a new key.
  // An unusual number is asked about (409) and that answer is stored under the key, so "Yes" goes with a new one.
  const [haulKey, setHaulKey] = useState(newKey);
  const [question, setQuestion] = useState<string | null>(null);

  // One request logs the haul in the ledger and settles the stop together; the hook puts the run's new state in the cache.
  const haulUrl = `/api/runs/${runId}/stops/${stopId}/haul`;
  const skipUrl = `/api/runs/${runId}/stops/${stopId}/skip`;
  const queueHaul = (vars: { bags: number; weightKg: number | null; confirmUnusual: boolean; idempotencyKey: string }) => {
    const body: Record<string, unknown> = { bags: vars.bags };
    if (vars.weightKg !== null) body.weightKg = vars.weightKg;
    if (vars.confirmUnusual) body.confirmUnusual = true;
    // The same key as the try that lost its answer: the server records it once either way.
    void queue?.(haulUrl, body, `Haul at ${dropPointName}: ${vars.bags} ${vars.bags === 1 ? "bag" : "bags"}`, stopId, vars.idempotencyKey);
    setMode("idle");
  };
  const log = useLogStopHaul(runId, stopId, {
    onError: (e, vars) => {
      if (queue && noSignal(e) && vars) return queueHaul(vars);
      setFields(fieldErrors(e));
      setQuestion(unusualQuestion(e));
      if (e instanceof ApiError && e.status !== 0) setHaulKey(newKey());
    },
  });
  const queueSkip = (why: string) => {
    void queue?.(skipUrl, { reason: why }, `Skip ${dropPointName}: “${why}”`, stopId);
    setMode("idle");
  };
  const skip = useSkipStop(runId, stopId, {
    onError: (e, why) => {
      if (queue && noSignal(e) && why !== undefined) return queueSkip(why);
      setFields(fieldErrors(e));
    },
  });

  if (mode === "idle") {
    return (
      <div className="flex flex-wrap gap-2">
        <Button type="button" onClick={() => setMode("log")}>Log the haul here</Button>
        <Button type="button" variant="secondary" onClick={() => setMode("skip")}>Skip with a reason</Button>
      </div>
    );
  }
  if (mode === "log") {
    return (
      <form
        className="flex flex-col gap-2"
        aria-label={`Log the haul at ${dropPointName}`}
        noValidate
        onSubmit={(e) => {
          e.preventDefault();
          // The same boxes as the Log page's haul form: anything but a number stops here, nothing else is sent.
          const numbers = parseNumberInputs({ bags: [bags, NUMBER_SPECS.stopBags], weightKg: [weight, weighed.spec] });
          setFields(numbers.errors as Record<string, string>);
          if (numbers.values.bags === null || Object.keys(numbers.errors).length > 0) return;
          const vars = { bags: numbers.values.bags, weightKg: weighed.toKg(numbers.values.weightKg), confirmUnusual: false, idempotencyKey: haulKey };
          if (queue && !navigator.onLine) return queueHaul(vars);
          log.mutate(vars);
        }}
      >
        {plannedOn && haulDayMismatch(plannedOn, new Date(), look.timeZone) ? (
          <Notice tone="caution" title="Not the run's day">
            This run is for {formatter(look).day(plannedOn)}. The haul will be logged for today; that is fine if it really happened today.
          </Notice>
        ) : null}
        <div className="grid grid-cols-2 gap-3">
          <NumberField id={`bags-${stopId}`} label="Bags" spec={NUMBER_SPECS.stopBags} value={bags} onChange={edit("bags", setBags)} error={fields.bags} />
          <NumberField id={`weight-${stopId}`} label={`Weight, ${weighed.unit} (optional)`} spec={weighed.spec} value={weight} onChange={edit("weightKg", setWeight)} error={fields.weightKg} />
        </div>
        {question ? (
          <ConfirmUnusual
            question={question}
            pending={log.isPending}
            onYes={() => {
              setQuestion(null);
              const last = log.variables;
              if (last) log.mutate({ ...last, confirmUnusual: true, idempotencyKey: haulKey });
            }}
            onNo={() => {
              setQuestion(null);
              log.reset();
            }}
          />
        ) : (
          <FormError message={log.isError ? log.error.message : null} />
        )}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={log.isPending || question !== null}>{log.isPending ? "Saving…" : "Save the haul"}</Button>
          <Button type="button" variant="quiet" onClick={() => setMode("idle")}>Cancel</Button>
        </div>
      </form>
    );
  }
  return (
    <form
      className="flex flex-col gap-2"
      aria-label={`Skip ${dropPointName}`}
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        setFields({});
        if (queue && !navigator.onLine) {
          if (reason.trim().length < 3) return setFields({ reason: "Say why this stop was skipped (a few words)" });
          return queueSkip(reason.trim());
        }
        skip.mutate(reason);
      }}
    >
      <Field id={`reason-${stopId}`} label="Why skip this stop?" hint="For example: closed, bin already emptied, no parking." value={reason} onChange={(e) => setReason(e.target.value)} error={fields.reason} />
      <FormError message={skip.isError ? skip.error.message : null} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="secondary" disabled={skip.isPending}>{skip.isPending ? "Saving…" : "Skip this stop"}</Button>
        <Button type="button" variant="quiet" onClick={() => setMode("idle")}>Cancel</Button>
      </div>
    </form>
  );
}
