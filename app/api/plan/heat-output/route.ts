import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { computeHeatOutput } from "@/lib/heaters/heat";
import { heatOutputInputSchema } from "@/lib/heaters/schemas";

// Open to anyone, like the can grid; nothing is stored.
export const POST = route(async (request) => {
  const input = await parseJson(request, heatOutputInputSchema);
  return NextResponse.json(computeHeatOutput(input));
});
