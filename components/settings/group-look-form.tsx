"use client";

import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError, RadioGroup, SelectField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { IDLE, typed, type ActionState } from "@/lib/api/action-state";
import { formatter, LOCALES, UNITS_LABEL, type Look, type Units } from "@/lib/format";
import { saveLookAction } from "@/lib/format/form-actions";

// A moment, a length, a weight and a distance, as the chosen look would show them.
const SAMPLE = { at: "2026-12-02T13:55:00Z", mm: 1165, kg: 4.5, km: 2.4 };

function sample(look: Look): string {
  const f = formatter(look);
  return `${f.moment(SAMPLE.at)} · ${f.number(1234567.5, 1)} · ${f.length(SAMPLE.mm)} · ${f.mass(SAMPLE.kg)} · ${f.distance(SAMPLE.km)}`;
}

/** The organiser's settings for how the group's pages, mail, sheets and exports show dates, numbers and measures. */
export function GroupLookForm({ look, timeZones }: { look: Look; timeZones: readonly string[] }) {
  const [state, send, pending] = useActionState<ActionState<Look>, FormData>(saveLookAction, IDLE);
  const saved = state.ok && state.data ? state.data : look;
  const [choice, setChoice] = useState<Look>({
    timeZone: typed(state, "timeZone", saved.timeZone),
    locale: typed(state, "locale", saved.locale),
    units: typed(state, "units", saved.units) as Units,
  });
  const set = (k: keyof Look) => (value: string) => setChoice((c) => ({ ...c, [k]: value }));
  const refusedWhole = state.ok === false && !Object.keys(state.fields).length ? state.message : null;

  return (
    <form action={send} noValidate className="flex flex-col gap-3" aria-label="How dates and numbers are shown">
      <FormError message={refusedWhole} />
      {/* A success only stands while no refusal replaced it: each answer replaces the last. */}
      {state.ok ? <Notice tone="good" title="Saved">Every page, mail, printed sheet and export of the group now uses it.</Notice> : null}
      <SelectField
        id="look-time-zone"
        name="timeZone"
        label="Time zone"
        hint="The group's day and clock: when a drive day starts and ends, and the times on entries."
        value={choice.timeZone}
        onChange={(e) => set("timeZone")(e.target.value)}
        options={timeZones.map((z) => ({ value: z, label: z.replaceAll("_", " ") }))}
        error={state.fields.timeZone}
      />
      <SelectField
        id="look-locale"
        name="locale"
        label="Dates and numbers written as in"
        value={choice.locale}
        onChange={(e) => set("locale")(e.target.value)}
        options={LOCALES.map((l) => ({ value: l.code, label: l.label }))}
        error={state.fields.locale}
      />
      <RadioGroup
        id="look-units"
        name="units"
        label="Units"
        value={choice.units}
        onChange={set("units")}
        options={(Object.keys(UNITS_LABEL) as Units[]).map((u) => ({ value: u, label: UNITS_LABEL[u] }))}
        error={state.fields.units}
      />
      <p className="text-ink-soft" data-testid="look-sample">
        Looks like: <span className="font-semibold">{sample(choice)}</span>
      </p>
      <div>
        <Button type="submit" disabled={pending}>{pending ? "Saving…" : "Save"}</Button>
      </div>
    </form>
  );
}
