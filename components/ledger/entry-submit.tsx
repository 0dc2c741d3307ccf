"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ConfirmUnusual } from "./confirm-unusual";
import type { SubmitResult } from "./use-outbox";

// What the log's entry forms (haul, sort, processing) share: sending through the
// outbox, the server's question about an unusual number (Yes sends it again,
// confirmed), a refusal shown with everything still typed, and what was saved or
// queued said in words.

export type Submit = (url: string, body: unknown, label: string) => Promise<SubmitResult>;
/** Clears the form after an entry was saved or queued and says what happened (a queued entry's words come from the outbox). */
export type Saved = (result: Exclude<SubmitResult, { kind: "refused" }>) => string;

interface Ask {
  question: string;
  confirm: () => Promise<SubmitResult>;
  saved: Saved;
}

export interface EntryStatus {
  message: { tone: "good" | "info" | "error"; text: string } | null;
  pending: boolean;
  ask: Ask | null;
  answerYes: () => void;
  answerNo: () => void;
}

/** `clear()` at the start of every try: an earlier "recorded" must not stand above this try's errors. */
export function useEntrySubmit(): { send: (attempt: () => Promise<SubmitResult>, saved: Saved) => Promise<void>; clear: () => void; refuse: (text: string) => void; status: EntryStatus } {
  const [message, setMessage] = useState<EntryStatus["message"]>(null);
  const [pending, setPending] = useState(false);
  const [ask, setAsk] = useState<Ask | null>(null);

  async function send(attempt: () => Promise<SubmitResult>, saved: Saved) {
    setPending(true);
    const result = await attempt();
    setPending(false);
    setAsk(null);
    if (result.kind === "refused" && result.question && result.confirm) return setAsk({ question: result.question, confirm: result.confirm, saved });
    if (result.kind === "refused") return setMessage({ tone: "error", text: result.message });
    setMessage({ tone: result.kind === "done" ? "good" : "info", text: saved(result) });
  }

  const answerYes = () => {
    if (ask) void send(ask.confirm, ask.saved);
  };
  return { send, clear: () => setMessage(null), refuse: (text: string) => setMessage({ tone: "error", text }), status: { message, pending, ask, answerYes, answerNo: () => setAsk(null) } };
}

/** The question, the answer and the form's button, in that order. */
export function EntryActions({ status, label }: { status: EntryStatus; label: string }) {
  const { message, pending, ask } = status;
  return (
    <>
      {ask ? <ConfirmUnusual question={ask.question} pending={pending} onYes={status.answerYes} onNo={status.answerNo} /> : null}
      {message?.tone === "error" ? <FormError message={message.text} /> : message ? <Notice tone={message.tone === "good" ? "good" : "info"} title={message.text} /> : null}
      <Button type="submit" disabled={pending || ask !== null}>
        {pending ? "Saving…" : label}
      </Button>
    </>
  );
}
