import { NextResponse } from "next/server";
import { endpoint } from "@/lib/api/endpoint";
import { pingDatabase } from "@/lib/db";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: "anyone" }, async () => {
  const up = await pingDatabase();
  return up
    ? NextResponse.json({ status: "ok", db: "up" })
    : NextResponse.json({ status: "degraded", db: "down" }, { status: 503 });
});
