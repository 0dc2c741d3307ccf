"use server";

// The drive forms' server actions (declared with action(), lib/api/action.ts):
// the same schemas, resolvers, rate limits and functions as the JSON routes
// under app/api/drives, app/api/drop-points and app/api/public/drives.
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { action } from "@/lib/api/action";
import type { ActionState } from "@/lib/api/action-state";
import { idPath, slugPath, slugSegment, uuidSegment } from "@/lib/api/path";
import { NUMBER_SPECS, type NumberSpec } from "@/lib/forms/number-input";
import { noun } from "@/lib/plural";
import { createDrive, createDropPoint, updateDrive, updateDropPoint } from "./commands";
import { FILL_REPORT_LIMITS, PLEDGE_LIMITS } from "./limits";
import { createFillReport, createPledge } from "./public-actions";
import { ownDrive, ownDropPoint } from "./resource";
import { driveInput, dropPointInput, fillReportInput, pledgeInput } from "./schemas";

export type PledgeAnswer = { id: string; mailed: boolean; email: string };

const pledgeRun = action(
  {
    who: "anyone",
    params: slugPath(),
    schema: pledgeInput,
    numbers: { bags: NUMBER_SPECS.pledgeBags },
    limits: PLEDGE_LIMITS,
  },
  async ({ params, input }) => ({ ...(await createPledge(params.slug, input)), email: input.email }),
);
export async function pledgeAction(previous: ActionState<PledgeAnswer>, formData: FormData) {
  return pledgeRun(previous, formData);
}

const levelSpec: NumberSpec = { noun: noun("percent", "percent"), required: true, min: 0, max: 100, message: "Choose how full the bin is." };
const fillRun = action(
  {
    who: "anyone",
    params: z.object({ slug: slugSegment("That drive"), pointId: uuidSegment("That drop point") }),
    schema: fillReportInput,
    numbers: { level: levelSpec },
    limits: FILL_REPORT_LIMITS,
  },
  async ({ params, input }) => ({ id: (await createFillReport(params.slug, params.pointId, input)).id }),
);
export async function fillReportAction(previous: ActionState<{ id: string }>, formData: FormData) {
  return fillRun(previous, formData);
}

const driveForm = { schema: driveInput, checkboxes: ["isPublic"] } as const;

const createDriveRun = action({ who: ["organiser"], ...driveForm }, async ({ actor, input }) => createDrive(actor.group.id, input));
export async function createDriveAction(previous: ActionState<unknown>, formData: FormData): Promise<ActionState<unknown>> {
  const state = await createDriveRun(previous, formData);
  if (state.ok) redirect(`/organise/drives/${(state.data as { id: string }).id}`);
  return state;
}

const updateDriveRun = action({ who: ["organiser"], params: idPath("That drive"), resource: ownDrive, ...driveForm }, async ({ actor, resource, input }) => {
  await updateDrive(actor.group.id, resource.id, input);
  revalidatePath(`/organise/drives/${resource.id}`);
  return { id: resource.id };
});
export async function updateDriveAction(previous: ActionState<unknown>, formData: FormData): Promise<ActionState<unknown>> {
  return updateDriveRun(previous, formData);
}

const dropPointForm = {
  schema: dropPointInput,
  numbers: { lat: "decimal", lng: "decimal", capacityBags: NUMBER_SPECS.capacityBags },
  checkboxes: ["active"],
} as const;

const createDropPointRun = action(
  { who: ["organiser"], params: z.object({ driveId: uuidSegment("That drive") }), resource: (actor, p) => ownDrive(actor, { id: p.driveId }), ...dropPointForm },
  async ({ actor, resource, input }) => {
    const point = await createDropPoint(actor.group.id, resource.id, input);
    revalidatePath(`/organise/drives/${resource.id}`);
    return { id: point?.id };
  },
);
export async function createDropPointAction(previous: ActionState<unknown>, formData: FormData) {
  return createDropPointRun(previous, formData);
}

const updateDropPointRun = action({ who: ["organiser"], params: idPath("That drop point"), resource: ownDropPoint, ...dropPointForm }, async ({ actor, resource, input }) => {
  await updateDropPoint(actor.group.id, resource.id, input);
  revalidatePath(`/organise/drop-points/${resource.id}`);
  return { id: resource.id };
});
export async function updateDropPointAction(previous: ActionState<unknown>, formData: FormData) {
  return updateDropPointRun(previous, formData);
}
