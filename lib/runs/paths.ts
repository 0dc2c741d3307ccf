import { z } from "zod";
import { uuidSegment } from "@/lib/api/path";

/** `/api/runs/{id}/stops/{stopId}/…` */
export const stopPath = z.object({ id: uuidSegment("That pickup run"), stopId: uuidSegment("That stop") });
