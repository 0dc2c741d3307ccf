import { PublicFooter, PublicHeader } from "@/components/layout/public-header";

// No database check here: pages that need none (sign-in, the planner) stay up
// without it; the landing page and app/error.tsx say when it is unreachable.
export default function PublicLayout({ children }: { children: React.ReactNode }) {
  return (
    <>
      <PublicHeader />
      {children}
      <PublicFooter />
    </>
  );
}
