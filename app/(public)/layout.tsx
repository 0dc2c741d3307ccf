import { PublicFooter, PublicHeader } from "@/components/layout/public-header";
import { DatabaseDown } from "@/components/system/database-down";
import { pingDatabase } from "@/lib/db";

export const dynamic = "force-dynamic";

export default async function PublicLayout({ children }: { children: React.ReactNode }) {
  const dbUp = await pingDatabase();
  return (
    <>
      <PublicHeader />
      {dbUp ? children : <DatabaseDown />}
      <PublicFooter />
    </>
  );
}
