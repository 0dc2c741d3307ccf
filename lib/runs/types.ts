import type { RunState, StopStatus } from "./schemas";
import type { Suggestion } from "./suggest";
import type { DropPointPlace } from "@/lib/drives/types";
import type { OpeningHours } from "@/lib/drives/opening-hours";

// The pickup-run endpoints' answers, as both sides see them: the server's
// queries declare they return these, and the client's hooks read them. Safe
// in the client (no server imports).

export interface RunSummary {
  id: string;
  driveId: string;
  driveName: string;
  plannedOn: string;
  state: RunState;
  distanceKm: number;
  assigneeId: string | null;
  assigneeName: string | null;
  stops: number;
  logged: number;
  skipped: number;
}

export interface RunStop {
  id: string;
  position: number;
  legKm: number;
  status: StopStatus;
  skipReason: string | null;
  haulId: string | null;
  resolvedAt: string | null;
  /** `movementId` is the ledger entry to undo (POST /api/movements/{id}/reversal), which reopens the stop. */
  haul: { bags: number; weightKg: number | null; estimatedCans: number; movementId: string } | null;
  /** The place, with what the driver needs and the public never sees. */
  dropPoint: DropPointPlace & {
    accessNotes: string;
    hostName: string | null;
    hostPhone: string | null;
    hostEmail: string | null;
    /** Structured spans (ISO 8601 weekdays); empty when none are recorded. */
    openingHours: OpeningHours;
  };
  /** Open at some time on the run's day by its opening hours; null when no hours are recorded. A warning, never a block. */
  openOnRunDay: boolean | null;
}

export interface RunDetail extends RunSummary {
  driveSlug: string;
  start: { lat: number; lng: number };
  returnToStart: boolean;
  notes: string;
  createdByName: string | null;
  cancelledAt: string | null;
  cancelReason: string | null;
  cancelledByName: string | null;
  stopList: RunStop[];
  /** Pending stops closed on the run's day by their opening hours (lib/runs/warnings.ts). */
  warnings: RunWarning[];
}

/** A warning that never blocks: shown beside the run or a haul, and sent with write answers. */
export interface RunWarning {
  kind: "closedOnRunDay" | "haulOffRunDay";
  stopId?: string;
  message: string;
}

/** Where a drop point is, what it holds and when it is open, as the planner shows it (its id comes with the suggestion). */
export type PlannerPlace = Omit<DropPointPlace, "id"> & { openingHours: OpeningHours };

/**
 * One drop point as the planner offers it (GET /api/runs/suggestions), as JSON:
 * the server's PlannerPoint with its dates as ISO strings.
 */
export type SuggestionRow = PlannerPlace & Omit<Suggestion, "lastHaulAt"> & { lastHaulAt: string | null };

/** The answer of POST /api/plan/route: stops in visiting order and the legs between them. */
export interface RouteAnswer {
  order: string[];
  distanceKm: number;
  legs: { from: string | null; to: string | null; distanceKm: number }[];
}
