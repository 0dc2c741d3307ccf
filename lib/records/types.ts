import type { DriveFillReport, DrivePledge, DropPointRecord } from "@/lib/drives/types";

/** The most fill reports, and the most photos, the archived view lists (the newest); `totals` counts them all. */
export const ARCHIVED_SHOWN = 100;

/** A photo as the archived view lists it: a drop point's own, or one of its fill reports'. */
export interface ArchivedPhoto {
  id: string;
  url: string;
  name: string;
  of: "dropPoint" | "fillReport";
  dropPointId: string;
  dropPointName: string;
}

/** GET /api/drives/{id}/archived: what is archived on one drive. */
export interface ArchivedOfDrive {
  dropPoints: DropPointRecord[];
  pledges: DrivePledge[];
  /** The newest ARCHIVED_SHOWN. */
  fillReports: DriveFillReport[];
  /** The newest ARCHIVED_SHOWN. */
  photos: ArchivedPhoto[];
  /** How many of each are archived in all (more than listed when a list stops at ARCHIVED_SHOWN). */
  totals: { dropPoints: number; pledges: number; fillReports: number; photos: number };
}
