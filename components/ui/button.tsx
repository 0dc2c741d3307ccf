import type { ButtonHTMLAttributes } from "react";

export type Variant = "primary" | "secondary" | "quiet" | "danger";

const VARIANT: Record<Variant, string> = {
  primary: "bg-ember text-white hover:bg-ember-deep border-ember",
  secondary: "bg-paper text-ink border-ink/70 hover:bg-paper-deep",
  quiet: "bg-transparent text-ember-deep border-transparent hover:bg-ember-soft",
  danger: "bg-alarm text-white border-alarm hover:brightness-95",
};

const BASE =
  "inline-flex min-h-11 items-center justify-center gap-2 rounded-lg border-2 px-4 py-2 font-semibold no-underline transition disabled:cursor-not-allowed disabled:opacity-60";

export function buttonClass(variant: Variant = "primary", extra = ""): string {
  return `${BASE} ${VARIANT[variant]} ${extra}`;
}

export function Button({
  variant = "primary",
  className = "",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button className={buttonClass(variant, className)} {...props} />;
}
