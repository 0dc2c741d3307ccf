import type { HeaterState } from "./unit-schemas";

// The heater endpoints' answers, as both sides see them: the server's queries
// declare they return these, and the client's hooks read them. Safe in the
// client (no server imports).

/** One entry of `GET /api/heaters`: the contract's fields plus the unit's need. */
export interface HeaterSummary {
  id: string;
  name: string;
  driveId: string | null;
  builderId: string | null;
  cans: number;
  claimed: number;
  builtIn: number;
  state: HeaterState;
  spare: number;
  need: number;
  remaining: number;
  /** An archived unit is left out of GET /api/heaters unless `?archived=1` asks for them. */
  archived: boolean;
}

/** The part of a unit every write answers with (POST /api/heaters, …/state adds `released`). */
export interface SavedHeater {
  id: string;
  name: string;
  cans: number;
  state: HeaterState;
}

export type ClaimAction = "claims" | "releases" | "built-in";

/** The answer of a claim, release or built-in movement. */
export interface ClaimResult {
  movementId: string;
  claimed: number;
  builtIn: number;
}
