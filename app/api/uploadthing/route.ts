import { createRouteHandler } from "uploadthing/next";
import { endpoint } from "@/lib/api/endpoint";
import { fileRouter } from "@/lib/uploads/file-router";

// uploadthing speaks its own protocol (CONTRACT.md); its router checks roles per
// upload slug and the upload service's callbacks carry a signature. Declared
// like every route so the cross-site refusal holds here too.
const uploads = createRouteHandler({ router: fileRouter });

export const GET = endpoint({ who: "anyone" }, async ({ request }) => uploads.GET(request));
export const POST = endpoint({ who: "anyone" }, async ({ request }) => uploads.POST(request));
