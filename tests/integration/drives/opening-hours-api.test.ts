import { describe, expect, it } from "vitest";
import { testDb } from "@/tests/support/db";
import { DEMO } from "@/tests/support/env";
import { signedIn } from "@/tests/support/http";
import { freshGroupForFile } from "@/tests/support/ledger";

// Structured opening hours on a drop point (issue 16): stored as ISO 8601 weekday spans,
// read back on the drop point and on a run's stop; bad spans are 422; the free text stays.
const g = freshGroupForFile("opening-hours");

describe("a drop point's opening hours", () => {
  it("stores the spans beside the free-text notes and shows them on a run's stop", async () => {
    const org = await g.client("organiser");
    const point = g.dropPointIds[0]!;
    const spans = [{ days: [6, 7], opens: "09:00", closes: "13:00" }];
    const saved = await org.json<{ openingHours: unknown; hours: string }>("PATCH", `/api/drop-points/${point}`, { openingHours: spans, hours: "Ring the side bell" });
    expect(saved.status).toBe(200);
    expect(saved.body.openingHours).toEqual(spans);
    expect(saved.body.hours).toBe("Ring the side bell");
    expect((await testDb()("drop_points").where({ id: point }).first()).opening_hours).toEqual(spans);

    const vol = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
    const run = await org.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn: "2027-01-07", start: { lat: 47.19, lng: -8 }, dropPointIds: [point], assigneeId: vol });
    const detail = await org.json<{ stopList: { dropPoint: { openingHours: unknown }; openOnRunDay: boolean | null }[] }>("GET", `/api/runs/${run.body.id}`);
    expect(detail.body.stopList[0]!.dropPoint.openingHours).toEqual(spans);
    expect(detail.body.stopList[0]!.openOnRunDay).toBe(false); // 2027-01-07 is a Thursday

    // The form's hidden field sends JSON text; empty clears the spans.
    const cleared = await org.json<{ openingHours: unknown }>("PATCH", `/api/drop-points/${point}`, { openingHours: "" });
    expect(cleared.body.openingHours).toEqual([]);
  });

  it("refuses bad spans with 422 and another group's drop point with 404", async () => {
    const org = await g.client("organiser");
    const point = g.dropPointIds[1]!;
    for (const bad of [[{ days: [0], opens: "09:00", closes: "13:00" }], [{ days: [1], opens: "13:00", closes: "09:00" }], [{ days: [], opens: "09:00", closes: "10:00" }], "{not json"]) {
      const res = await org.json<{ error: { fields: Record<string, string> } }>("PATCH", `/api/drop-points/${point}`, { openingHours: bad });
      expect(res.status, JSON.stringify(bad)).toBe(422);
      expect(Object.keys(res.body.error.fields).some((k) => k.startsWith("openingHours"))).toBe(true);
    }
    const other = await signedIn(DEMO.organiser);
    expect((await other.json("PATCH", `/api/drop-points/${point}`, { openingHours: [] })).status).toBe(404);
  });
});
