import type { Metadata } from "next";
import { DriveForm } from "@/components/drives/organise/drive-form";
import { Card } from "@/components/ui/card";
import { requirePageRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "New drive" };

export default async function NewDrivePage() {
  await requirePageRole("/organise/drives/new", "organiser");
  return (
    <main className="flex flex-col gap-6">
      <h1 className="text-3xl">New drive</h1>
      <Card>
        <DriveForm />
      </Card>
    </main>
  );
}
