import "server-only";
import type { EndpointContext } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import type { Actor } from "@/lib/auth/queries";
import { recordLabel, type RecordKind } from "./kinds";
import { deleteRecord, setRecordArchived } from "./commands";
import { ownRecord, type OwnRecord } from "./resource";
import { recordArchiveInput, recordDeleteInput, type RecordDeleteInput } from "./schemas";

// The three routes every archivable kind has (issue 16), declared from these so
// they cannot drift apart (each route file still says `endpoint(...)` itself):
// organisers of the group only; another group's record is 404 before the body
// is read; a signed-in POST with an Idempotency-Key keeps its first answer.
type Ctx<B> = EndpointContext<readonly ["organiser"], { id: string }, undefined, B, OwnRecord>;

/** POST /api/<kind>/{id}/archive or …/restore: no fields; 409 when it already is so. */
export const archiveSpec = (kind: RecordKind) =>
  ({ who: ["organiser"] as const, params: idPath(recordLabel(kind)), resource: ownRecord(kind), body: recordArchiveInput });

export const archiveWork = (kind: RecordKind, archive: boolean) => async ({ actor, params }: Ctx<Record<string, never>>) =>
  setRecordArchived(actor as Actor, kind, params.id, archive);

/** POST /api/<kind>/{id}/delete {confirm: true}: 409 while any ledger line (or pickup run) refers to it. */
export const deleteSpec = (kind: RecordKind) =>
  ({ who: ["organiser"] as const, params: idPath(recordLabel(kind)), resource: ownRecord(kind), body: recordDeleteInput });

export const deleteWork = (kind: RecordKind) => async ({ actor, params }: Ctx<RecordDeleteInput>) => deleteRecord(actor as Actor, kind, params.id);
