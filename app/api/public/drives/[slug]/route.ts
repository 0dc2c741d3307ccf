import { endpoint } from "@/lib/api/endpoint";
import { slugPath } from "@/lib/api/path";
import { publicDrive } from "@/lib/drives/public-service";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: "anyone", params: slugPath() }, async ({ params }) => publicDrive(params.slug));
