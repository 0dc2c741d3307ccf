import { createRouteHandler } from "uploadthing/next";
import { endpoint } from "@/lib/api/endpoint";
import { AppError } from "@/lib/api/errors";
import { toErrorResponse } from "@/lib/api/handler";
import { fileRouter } from "@/lib/uploads/file-router";

// uploadthing speaks its own protocol (CONTRACT.md); its router checks roles per
// upload slug and the upload service's callbacks carry a signature. Declared
// like every route so the cross-site refusal holds here too.
const uploads = createRouteHandler({ router: fileRouter });

/** uploadthing answers a request it cannot read with plain text; give it the contract's error JSON. */
function asContractError(res: Response): Response {
  if (res.ok || (res.headers.get("content-type") ?? "").includes("json")) return res;
  return toErrorResponse(new AppError("invalid_input", "The upload request was not understood. Reload the page and try again."));
}

export const GET = endpoint({ who: "anyone" }, async ({ request }) => asContractError(await uploads.GET(request)));
export const POST = endpoint({ who: "anyone" }, async ({ request }) => asContractError(await uploads.POST(request)));
