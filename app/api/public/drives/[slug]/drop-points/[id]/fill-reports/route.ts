import { z } from "zod";
import { endpoint } from "@/lib/api/endpoint";
import { slugSegment, uuidSegment } from "@/lib/api/path";
import { createFillReport } from "@/lib/drives/public-actions";
import { FILL_REPORT_LIMITS } from "@/lib/drives/limits";
import { fillReportInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

const path = z.object({ slug: slugSegment("That drive"), id: uuidSegment("That drop point") });

// Anyone standing at a drop point may say how full its bin is.
export const POST = endpoint(
  { who: "anyone", params: path, body: fillReportInput, status: 201, limits: FILL_REPORT_LIMITS },
  async ({ params, body }) => createFillReport(params.slug, params.id, body),
);
