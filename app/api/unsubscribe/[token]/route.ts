import { NextResponse } from "next/server";
import { endpoint } from "@/lib/api/endpoint";
import { notFound } from "@/lib/api/errors";
import { NOTIFICATION_TEXT } from "@/lib/notify/kinds";
import { UNSUBSCRIBE_LIMITS } from "@/lib/notify/limits";
import { unsubscribePath } from "@/lib/notify/schemas";
import { unsubscribe } from "@/lib/notify/settings-queries";
import { readUnsubscribeToken } from "@/lib/notify/unsubscribe";

export const dynamic = "force-dynamic";

// RFC 8058 one-click unsubscribe. The List-Unsubscribe header points here.
// POST (what a mail provider sends, body "List-Unsubscribe=One-Click", no
// cookies) switches that kind off at once: the signed token is the only
// credential, no session is read. GET never changes anything (link scanners
// and prefetchers open links): it sends the person to the confirm page.

export const GET = endpoint({ who: "anyone", params: unsubscribePath }, async ({ params }) => {
  if (!readUnsubscribeToken(params.token)) throw notFound("That unsubscribe link");
  return new NextResponse(null, { status: 303, headers: { location: `/unsubscribe/${params.token}` } });
});

// No body schema: RFC 8058 §3.1 fixes the body (List-Unsubscribe=One-Click, form-encoded), and the token is what counts.
export const POST = endpoint({ who: "anyone", params: unsubscribePath, limits: UNSUBSCRIBE_LIMITS }, async ({ params }) => {
  const link = readUnsubscribeToken(params.token);
  if (!link || !(await unsubscribe(link.userId, link.kind, "oneClick"))) throw notFound("That unsubscribe link");
  return { unsubscribed: link.kind, label: NOTIFICATION_TEXT[link.kind].label };
});
