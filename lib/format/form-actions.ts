"use server";

// The group's look (time zone, locale, units) saved from the organiser's
// settings form; PUT /api/group/look is the JSON way in, with the same schema
// and function.
import { revalidatePath } from "next/cache";
import { action } from "@/lib/api/action";
import type { ActionState } from "@/lib/api/action-state";
import { saveGroupLook } from "./group-look-queries";
import type { Look } from "./look";
import { lookInput } from "./schemas";

// No resource: saveGroupLook writes only the actor's own group.
const saveLookRun = action({ who: ["organiser"], schema: lookInput }, async ({ actor, input }) => {
  const look = await saveGroupLook(actor.group.id, input);
  // Every page of the group formats with it; the layout's pages are rendered per request.
  revalidatePath("/", "layout");
  return look;
});

export async function saveLookAction(previous: ActionState<Look>, formData: FormData) {
  return saveLookRun(previous, formData);
}
