"use client";

import { useRouter } from "next/navigation";
import { useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { NUMBER_SPECS, parseNumberInput } from "@/lib/forms/number-input";
import { countOf } from "@/lib/plural";
import { ApiError } from "@/lib/api/client";
import { useHeaterMovement } from "@/hooks/queries/heaters";

/**
 * A small form: how many cans, one button; the server's 409 or 422 shows next
 * to it. `check` refuses before sending what the server would refuse anyway
 * (with the server's own message), e.g. a claim past the unit's need.
 */
export function QuantityAction({
  id,
  label,
  hint,
  initial,
  submitLabel,
  variant = "primary",
  run,
  check,
  children,
}: {
  id: string;
  label: string;
  hint?: ReactNode;
  initial: number;
  submitLabel: string;
  variant?: "primary" | "secondary";
  run: (quantity: number, key: string) => Promise<unknown>;
  check?: (quantity: number) => string | null;
  children?: ReactNode;
}) {
  const router = useRouter();
  // Untouched, the field follows the server's suggestion as balances change.
  const [typed, setTyped] = useState<string | null>(null);
  const text = typed ?? String(initial);
  const [done, setDone] = useState<string | null>(null);
  const [refused, setRefused] = useState<string | null>(null);
  const [emptyError, setEmptyError] = useState<string | undefined>(undefined);
  const action = useHeaterMovement(run, {
    onSuccess: (_data, quantity) => {
      setDone(`${submitLabel}: ${countOf(quantity, "can")} recorded.`);
      setTyped(null);
      // The unit's figures and the drive's stock are react-query reads (refreshed by the hook); the rest of the page is the server's.
      router.refresh();
    },
  });
  const fieldError = (action.error instanceof ApiError ? action.error.fields?.quantity : undefined) ?? emptyError;
  return (
    <form
      className="flex flex-col gap-1"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        setDone(null);
        const typedNumber = parseNumberInput(text, NUMBER_SPECS.claimCans);
        setEmptyError(typedNumber.ok ? undefined : typedNumber.error);
        if (!typedNumber.ok || typedNumber.value === null) {
          action.reset();
          return;
        }
        const quantity = typedNumber.value;
        const refusal = check ? check(quantity) : null;
        setRefused(refusal);
        if (refusal) {
          action.reset();
          return;
        }
        action.mutate(quantity);
      }}
    >
      {children}
      <NumberField
        id={id}
        label={label}
        hint={hint}
        spec={NUMBER_SPECS.claimCans}
        value={text}
        error={fieldError}
        onChange={(raw) => {
          setTyped(raw);
          setRefused(null);
          setEmptyError(undefined);
        }}
      />
      <FormError message={refused ?? (action.error && !fieldError ? action.error.message : null)} />
      {done ? (
        <p role="status" className="text-sm font-semibold text-moss-deep">
          {done}
        </p>
      ) : null}
      <Button type="submit" variant={variant} disabled={action.isPending} className="self-start">
        {action.isPending ? "Saving…" : submitLabel}
      </Button>
    </form>
  );
}
