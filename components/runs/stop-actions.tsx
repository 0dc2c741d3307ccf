"use client";

import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { ApiError, fetchJson, fieldErrors, unusualQuestion } from "@/lib/api/client";
import { ConfirmUnusual } from "@/components/ledger/confirm-unusual";

function newKey(): string {
  // randomUUID needs a secure context; plain-HTTP previews get a random key of the same strength.
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, "0")).join("");
}

interface Props {
  runId: string;
  stopId: string;
  dropPointName: string;
  onDone: (run: unknown) => void;
}

/** Log a haul at this stop (a ledger movement, then the stop points at it), or skip it with a reason. */
export function StopActions({ runId, stopId, dropPointName, onDone }: Props) {
  const [mode, setMode] = useState<"idle" | "log" | "skip">("idle");
  const [bags, setBags] = useState("");
  const [weight, setWeight] = useState("");
  const [reason, setReason] = useState("");
  const [fields, setFields] = useState<Record<string, string>>({});
  // A retry after a dropped connection reuses the key, so the haul is never logged twice;
  // once the server has answered (say, a 422), the corrected entry is a new request with a new key.
  // An unusual number is asked about (409) and that answer is stored under the key, so "Yes" goes with a new one.
  const [haulKey, setHaulKey] = useState(newKey);
  const [question, setQuestion] = useState<string | null>(null);

  const log = useMutation({
    mutationFn: async ({ confirmUnusual }: { confirmUnusual: boolean }) => {
      const body: Record<string, unknown> = { bags: bags.trim() === "" ? 0 : Number(bags) };
      if (weight.trim() !== "") body.weightKg = Number(weight);
      if (confirmUnusual) body.confirmUnusual = true;
      // One request logs the haul in the ledger and settles the stop together.
      const res = await fetchJson<{ run: unknown }>(`/api/runs/${runId}/stops/${stopId}/haul`, { method: "POST", json: body, headers: { "Idempotency-Key": haulKey } });
      return res.run;
    },
    onSuccess: onDone,
    onError: (e) => {
      setFields(fieldErrors(e));
      setQuestion(unusualQuestion(e));
      if (e instanceof ApiError && e.status !== 0) setHaulKey(newKey());
    },
  });
  const skip = useMutation({
    mutationFn: () => fetchJson(`/api/runs/${runId}/stops/${stopId}/skip`, { method: "POST", json: { reason } }),
    onSuccess: onDone,
    onError: (e) => setFields(fieldErrors(e)),
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
          setFields({});
          log.mutate({ confirmUnusual: false });
        }}
      >
        <div className="grid grid-cols-2 gap-3">
          <Field id={`bags-${stopId}`} label="Bags" type="number" min={0} inputMode="numeric" value={bags} onChange={(e) => setBags(e.target.value)} error={fields.bags} />
          <Field id={`weight-${stopId}`} label="Weight, kg (optional)" type="number" min={0} step="0.1" inputMode="decimal" value={weight} onChange={(e) => setWeight(e.target.value)} error={fields.weightKg} />
        </div>
        {question ? (
          <ConfirmUnusual
            question={question}
            pending={log.isPending}
            onYes={() => {
              setQuestion(null);
              log.mutate({ confirmUnusual: true });
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
        skip.mutate();
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
