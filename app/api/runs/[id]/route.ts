import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { visibleRun } from "@/lib/runs/resource";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: ["organiser", "volunteer"], params: idPath("That pickup run"), resource: visibleRun }, async ({ resource }) => resource);
