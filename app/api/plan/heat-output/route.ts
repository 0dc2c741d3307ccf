import { endpoint } from "@/lib/api/endpoint";
import { computeHeatOutput } from "@/lib/heaters/heat";
import { heatOutputInputSchema } from "@/lib/heaters/schemas";

export const dynamic = "force-dynamic";

// Open to anyone, like the can grid; nothing is stored.
export const POST = endpoint({ who: "anyone", body: heatOutputInputSchema }, async ({ body }) => computeHeatOutput(body));
