"use client";

import { Button } from "@/components/ui/button";

/**
 * The server's question about an unusual number, asked before anything is
 * recorded: Yes sends the same entry again, confirmed; No goes back to the
 * form with every value as typed, to fix it.
 */
export function ConfirmUnusual({ question, pending, onYes, onNo }: { question: string; pending?: boolean; onYes: () => void; onNo: () => void }) {
  return (
    <div role="alertdialog" aria-label="Check this number" aria-describedby="unusual-question" className="rounded-card border-l-8 border-sun bg-sun-soft p-4">
      <p className="font-bold">Really?</p>
      <p id="unusual-question" className="mt-1">
        {question}
      </p>
      <p className="mt-1 text-sm text-ink-soft">Nothing is recorded until you answer.</p>
      <div className="mt-3 flex flex-wrap gap-2">
        <Button type="button" onClick={onYes} disabled={pending}>
          {pending ? "Saving…" : "Yes, record it"}
        </Button>
        <Button type="button" variant="secondary" onClick={onNo} disabled={pending}>
          No, let me fix it
        </Button>
      </div>
    </div>
  );
}
