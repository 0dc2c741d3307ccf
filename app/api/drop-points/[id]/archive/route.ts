import { endpoint } from "@/lib/api/endpoint";
import { archiveSpec, archiveWork } from "@/lib/records/routes";

export const dynamic = "force-dynamic";

export const POST = endpoint(archiveSpec("dropPoint"), archiveWork("dropPoint", true));
