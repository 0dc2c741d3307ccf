import { NextResponse } from "next/server";
import { pingDatabase } from "@/lib/db";

export const dynamic = "force-dynamic";

export async function GET() {
  const up = await pingDatabase();
  return up
    ? NextResponse.json({ status: "ok", db: "up" })
    : NextResponse.json({ status: "degraded", db: "down" }, { status: 503 });
}
