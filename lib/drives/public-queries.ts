import "server-only";
import { db } from "@/lib/db";

export interface PublicDriveSummary {
  slug: string;
  name: string;
  startsOn: string;
  endsOn: string;
}

// Dates leave as plain YYYY-MM-DD strings, never shifted by a time zone.
export const publicDriveColumns = () => [
  "slug",
  "name",
  db.raw(`to_char(starts_on, 'YYYY-MM-DD') as "startsOn"`),
  db.raw(`to_char(ends_on, 'YYYY-MM-DD') as "endsOn"`),
];

export async function listPublicDrives(): Promise<PublicDriveSummary[]> {
  return db("drives")
    .select(publicDriveColumns())
    .where({ is_public: true })
    .orderBy([{ column: "starts_on", order: "desc" }, { column: "name" }]);
}
