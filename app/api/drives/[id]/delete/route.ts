import { endpoint } from "@/lib/api/endpoint";
import { deleteSpec, deleteWork } from "@/lib/records/routes";

export const dynamic = "force-dynamic";

export const POST = endpoint(deleteSpec("drive"), deleteWork("drive"));
