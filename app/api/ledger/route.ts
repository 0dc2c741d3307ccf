import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { AppError, invalidInput } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { ledgerFilterSchema } from "@/lib/ledger/schemas";
import { listLedger, listMyEntries } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

// `?mine=1`: anyone's own recent entries (for undo). Otherwise the group's
// ledger with filters, for organisers.
export const GET = route(async (req: Request) => {
  const actor = await requireUser();
  const params = Object.fromEntries(new URL(req.url).searchParams);
  const parsed = ledgerFilterSchema.safeParse(params);
  if (!parsed.success) throw invalidInput(parsed.error);
  if (parsed.data.mine) return NextResponse.json(await listMyEntries(actor.group.id, actor.user.id));
  if (actor.role !== "organiser") throw new AppError("forbidden", "The full ledger is for organisers; add ?mine=1 for your own entries.");
  return NextResponse.json(await listLedger(actor.group.id, parsed.data));
});
