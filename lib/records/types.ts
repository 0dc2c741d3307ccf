import type { DriveFillReport, DrivePledge, DropPointRecord } from "@/lib/drives/types";

/** A drop point's photo as the archived view lists it. */
export interface ArchivedPhoto {
  id: string;
  url: string;
  name: string;
  dropPointId: string;
  dropPointName: string;
}

/** GET /api/drives/{id}/archived: what is archived on one drive. */
export interface ArchivedOfDrive {
  dropPoints: DropPointRecord[];
  pledges: DrivePledge[];
  fillReports: DriveFillReport[];
  photos: ArchivedPhoto[];
}
