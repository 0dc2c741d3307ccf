/**
 * The records around a drive that can be archived, restored and (when no ledger
 * line refers to them) deleted (issue 16). Client-safe: the words the screens show.
 * `path` is the API folder (/api/<path>/{id}/archive | restore | delete), `label`
 * the 404 label and the start of a sentence, `noun` the plain word for buttons.
 */
const RECORDS = {
  drive: { path: "drives", label: "That drive", noun: "drive" },
  dropPoint: { path: "drop-points", label: "That drop point", noun: "drop point" },
  photo: { path: "photos", label: "That photo", noun: "photo" },
  pledge: { path: "pledges", label: "That pledge", noun: "pledge" },
  fillReport: { path: "fill-reports", label: "That fill report", noun: "fill report" },
} as const;

export type RecordKind = keyof typeof RECORDS;

export const recordLabel = (kind: RecordKind): string => RECORDS[kind].label;
export const recordNoun = (kind: RecordKind): string => RECORDS[kind].noun;
export const recordUrl = (kind: RecordKind, id: string, action: "archive" | "restore" | "delete") => `/api/${RECORDS[kind].path}/${id}/${action}`;
