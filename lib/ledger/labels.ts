// The words people see for the ledger's codes: on the ledger screen, in the CSV
// export and in the charts. One place, so the three never disagree. Safe in the client.
//
// To add a stage, reason or movement kind, add one entry to its map. A code
// that has no entry yet still reads as words ("damagedInPunching" → "damaged
// in punching"), never as the raw code, so a new kind is never shown as code.

export const STAGE_LABEL: Record<string, string> = {
  hauled: "hauled, not yet sorted",
  good: "good",
  washed: "washed",
  opened: "opened",
  punched: "punched",
  claimed: "claimed for a unit",
  builtIn: "built in",
  rejected: "rejected",
  recycled: "recycled",
};

export const REASON_LABEL: Record<string, string> = {
  dented: "dented",
  crushed: "crushed",
  wrongSize: "wrong size",
  notAluminium: "not aluminium",
  damaged: "torn or dirty",
  other: "other",
  damagedWashing: "damaged in washing",
  damagedOpening: "damaged in opening",
  damagedPunching: "damaged in punching",
  stockCount: "stock count",
};

export const KIND_LABEL: Record<string, string> = {
  haul: "haul",
  sort: "sort",
  processing: "processing",
  claim: "claim",
  release: "release of a claim",
  builtIn: "built in",
  recycling: "taken to recycling",
  reversal: "undo",
  stockCount: "stock count",
};

/** "wrongSize" → "wrong size"; "not_aluminium" → "not aluminium". */
export function codeToWords(code: string): string {
  return code
    .replace(/([a-z0-9])([A-Z])/g, "$1 $2")
    .replace(/[_-]+/g, " ")
    .toLowerCase()
    .trim();
}

const pick = (map: Record<string, string>, code: string | null | undefined): string => (code ? (Object.hasOwn(map, code) ? map[code] : codeToWords(code)) : "");

export const stageLabel = (code: string | null | undefined) => pick(STAGE_LABEL, code);
export const reasonLabel = (code: string | null | undefined) => pick(REASON_LABEL, code);
export const kindLabel = (code: string | null | undefined) => pick(KIND_LABEL, code);

/** The move of one line in words: "good → washed", "into hauled, not yet sorted", "out of claimed for a unit". */
export function moveLabel(from: string | null, to: string | null): string {
  if (from && to) return `${stageLabel(from)} → ${stageLabel(to)}`;
  if (to) return `into ${stageLabel(to)}`;
  if (from) return `out of ${stageLabel(from)}`;
  return "";
}

/** "line 132": how a ledger line is referred to everywhere. */
export const lineLabel = (id: string | number) => `line ${id}`;

/** What a line is, in words: "haul", "undo of line 132". */
export function entryLabel(kind: string, reversesId: string | null): string {
  return reversesId ? `${kindLabel("reversal")} of ${lineLabel(reversesId)}` : kindLabel(kind);
}

export const capitalise = (s: string) => (s ? s[0].toUpperCase() + s.slice(1) : s);
