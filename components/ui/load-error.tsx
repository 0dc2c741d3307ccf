"use client";

import { Button } from "./button";
import { FormError } from "./field";

/** A list that could not be loaded: why, and a way to ask again. */
export function LoadError({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <div className="flex flex-col gap-2">
      <FormError message={message} />
      <Button variant="secondary" onClick={onRetry}>
        Try again
      </Button>
    </div>
  );
}
