import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { listPublicDrives } from "@/lib/drives/public-queries";

export const dynamic = "force-dynamic";

export const GET = route(async () => NextResponse.json(await listPublicDrives()));
