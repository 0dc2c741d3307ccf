import { endpoint } from "@/lib/api/endpoint";
import { listPublicDrives } from "@/lib/drives/public-queries";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: "anyone" }, async () => listPublicDrives());
