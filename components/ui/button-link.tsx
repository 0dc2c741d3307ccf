import Link from "next/link";
import type { ReactNode } from "react";
import { buttonClass, type Variant } from "./button";

// Kept apart from Button: client components that import Button (forms, the
// error page) would otherwise carry next/link's code into their bundles.
export function ButtonLink({
  href,
  variant = "primary",
  className = "",
  children,
}: {
  href: string;
  variant?: Variant;
  className?: string;
  children: ReactNode;
}) {
  return (
    <Link href={href} className={buttonClass(variant, className)}>
      {children}
    </Link>
  );
}
