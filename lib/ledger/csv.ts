// Column order and headings of the ledger's CSV export.
export const LEDGER_CSV_COLUMNS = [
  { key: "id", header: "line" },
  { key: "occurredAt", header: "occurred_at" },
  { key: "recordedAt", header: "recorded_at" },
  { key: "kind", header: "entry" },
  { key: "drive", header: "drive" },
  { key: "dropPoint", header: "drop_point" },
  { key: "heaterUnit", header: "heater_unit" },
  { key: "from", header: "from_stage" },
  { key: "to", header: "to_stage" },
  { key: "quantity", header: "quantity" },
  { key: "reason", header: "reason" },
  { key: "isEstimate", header: "estimate" },
  { key: "person", header: "recorded_by" },
  { key: "reversesId", header: "reverses_line" },
  { key: "movementId", header: "movement" },
  { key: "note", header: "note" },
];
