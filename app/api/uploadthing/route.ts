import { createRouteHandler } from "uploadthing/next";
import { endpoint } from "@/lib/api/endpoint";
import { fileRouter } from "@/lib/uploads/file-router";

// uploadthing speaks its own protocol (CONTRACT.md); its router checks roles per
// upload slug and the upload service's callbacks carry a signature. Declared
// like every route so the cross-site refusal holds here too.
const uploads = createRouteHandler({ router: fileRouter });

/**
 * uploadthing answers a request it cannot read with its own `{message}` (or plain text); add the
 * contract's error JSON beside it, keeping its status and its `message` for its own client.
 */
async function asContractError(res: Response): Promise<Response> {
  if (res.ok) return res;
  const text = await res.text();
  let sent: { message?: unknown; error?: { code?: unknown } } | null = null;
  try {
    sent = JSON.parse(text);
  } catch {
    sent = null;
  }
  if (sent?.error?.code) return new Response(text, { status: res.status, headers: res.headers });
  const message = typeof sent?.message === "string" ? sent.message : "The upload request was not understood. Reload the page and try again.";
  return Response.json({ error: { code: "invalid_input", message }, message }, { status: res.status });
}

export const GET = endpoint({ who: "anyone" }, async ({ request }) => asContractError(await uploads.GET(request)));
export const POST = endpoint({ who: "anyone" }, async ({ request }) => asContractError(await uploads.POST(request)));
