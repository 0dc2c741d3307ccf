import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "@/tests/support/db";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { DEMO } from "@/tests/support/env";
import { signedIn, type ApiClient } from "@/tests/support/http";

// Another group's records are 404 everywhere, never 403, and nothing is written.
const f = demoFixtureForFile();
let other: ApiClient;
let demoMovementId: string;
beforeAll(async () => {
  other = await signedIn(DEMO.otherOrganiser);
  demoMovementId = (await testDb()("movements").where({ drive_id: f.demoDriveId, kind: "processing" }).first()).id;
});

describe("another group's organiser", () => {
  it("gets 404 for the demo drive's stock, hauls, sorts, processing, heaters and entries", async () => {
    const theirs = () => testDb()("ledger_lines as l").join("users as u", "u.id", "l.recorded_by").where("u.email", DEMO.otherOrganiser).count({ n: "*" }).first();
    const lines = await theirs();
    const calls: [string, string, unknown][] = [
      ["GET", `/api/drives/${f.demoDriveId}/stock`, undefined],
      ["POST", `/api/drives/${f.demoDriveId}/hauls`, { dropPointId: f.demoDropPointId, bags: 2 }],
      ["POST", `/api/drives/${f.demoDriveId}/processing`, { from: "good", to: "washed", quantity: 1 }],
      ["POST", `/api/drives/${f.demoDriveId}/sorts`, { haulIds: [f.demoDropPointId], good: 1 }],
      ["POST", `/api/heaters/${f.demoHeaterId}/claims`, { quantity: 1 }],
      ["POST", `/api/heaters/${f.demoHeaterId}/releases`, { quantity: 1 }],
      ["POST", `/api/heaters/${f.demoHeaterId}/built-in`, { quantity: 1 }],
      ["POST", `/api/movements/${demoMovementId}/reversal`, undefined],
      // Their own drive with the demo group's drop point:
      ["POST", `/api/drives/${f.otherDriveId}/hauls`, { dropPointId: f.demoDropPointId, bags: 2 }],
    ];
    for (const [method, path, body] of calls) {
      const res = await other.json<{ error: { code: string } }>(method, path, body);
      expect(res.status, `${method} ${path}`).toBe(404);
      expect(res.body.error.code).toBe("not_found");
    }
    const heaters = (await other.json<{ id: string }[]>("GET", "/api/heaters")).body;
    expect(heaters.map((h) => h.id)).not.toContain(f.demoHeaterId);
    expect(heaters.map((h) => h.id)).toContain(f.otherHeaterId);
    expect((await theirs())?.n).toBe(lines?.n);
  });
});
