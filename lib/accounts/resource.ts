import "server-only";
import type { Resolver } from "@/lib/api/endpoint";
import { findMember, type Member } from "./queries";

// How routes resolve the member they act on: a member of the actor's group (404 otherwise).
export const groupMember: Resolver<{ userId: string }, Member> = (actor, { userId }) => findMember(actor.group.id, userId);
