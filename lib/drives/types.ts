// The drive endpoints' answers, as both sides see them: the server's queries
// declare they return these, and the client's hooks and components read them.
// Safe in the client (no server imports).
import type { PledgeStatus } from "./schemas";

/** GET /api/public/drives/:slug: the public page's drive and its progress. */
export interface PublicDriveView {
  drive: { slug: string; name: string; startsOn: string; endsOn: string; description: string; wanted: string; groupName: string };
  target: { cans: number; heaters: number };
  progress: { goodCans: number; estimatedUnsorted: number; yield: number; remaining: number; heatersCovered: number };
}

/** Where a drop point is, when it is open and how many bags its bin holds: what every view of one shows. */
export interface DropPointPlace {
  id: string;
  name: string;
  address: string;
  lat: number;
  lng: number;
  hours: string;
  capacityBags: number;
}

export interface PublicDropPointRow extends DropPointPlace {
  fillLevel: number | null;
  fillReportedAt: string | null;
  /** The bin's fill now: its newest report since the last haul or clear (lib/drives/fill.ts); null when none. */
  fill: { level: number; reportedAt: string } | null;
  photos: string[];
}

// Only public columns are selected: host name, phone and e-mail never leave.
export interface PublicDropPointWithTallies extends PublicDropPointRow {
  tallies: { hauls: number; bags: number; goodCans: number; rejectedCans: number };
}

/** One drop point of GET /api/public/drives/:slug/drop-points (public columns only). */
export type PublicDropPointView = PublicDropPointWithTallies;

/** A drop point as its organiser edits it (host details included). */
export interface DropPointRecord {
  id: string;
  driveId: string;
  name: string;
  address: string;
  lat: number;
  lng: number;
  hours: string;
  hostName: string;
  hostPhone: string;
  hostEmail: string;
  capacityBags: number;
  openingHours: import("./opening-hours").OpeningHours;
  active: boolean;
  /** ISO time it was archived (issue 16), or null. */
  archivedAt: string | null;
}

/** A bin reported full on the organiser's dashboard. */
export interface FullBin {
  dropPointId: string;
  dropPointName: string;
  level: number;
  reportedAt: string;
}

/** A pledge on the organiser's drive page (rendered on the server, so the dates are Dates). */
export interface DrivePledge {
  id: string;
  name: string | null;
  email: string | null;
  bags: number;
  bringOn: string;
  dropPointName: string;
  dropPointId: string;
  /** Open, cancelled by the donor, or marked by the organiser (PLEDGE_STATUSES). */
  status: PledgeStatus;
  haulId: string | null;
  createdAt: Date;
}

/** A haul a received pledge may name (the organiser's drive page). */
export interface PledgeHaulChoice {
  id: string;
  dropPointId: string;
  hauledAt: Date;
  bags: number;
}

/** A "bin is full" report on the organiser's drive page. */
export interface DriveFillReport {
  id: string;
  level: number;
  note: string;
  alerted: boolean;
  createdAt: Date;
  dropPointName: string;
  photoUrl: string | null;
}

/** A drive as the entry forms and the ledger's filters offer it, with its active drop points. */
export interface LogDrive {
  id: string;
  name: string;
  startsOn: string;
  endsOn: string;
  dropPoints: { id: string; name: string }[];
}
