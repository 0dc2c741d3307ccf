import "server-only";
import type { Resolver } from "@/lib/api/endpoint";
import { getRun, type RunDetail } from "./queries";

// How routes resolve the pickup run they act on: the group's run, and for a
// volunteer only their own (getRun says 404 otherwise).
export const visibleRun: Resolver<{ id: string }, RunDetail> = (actor, { id }) => getRun(actor, id);
