import { endpoint } from "@/lib/api/endpoint";
import { slugPath } from "@/lib/api/path";
import { publicDropPoints } from "@/lib/drives/public-service";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: "anyone", params: slugPath() }, async ({ params }) => publicDropPoints(params.slug));
