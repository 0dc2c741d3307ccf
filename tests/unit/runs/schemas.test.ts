import { describe, expect, it } from "vitest";
import { createRunInputSchema, skipStopInputSchema } from "@/lib/runs/schemas";

const ok = {
  driveId: "6f1c2a9e-4b7d-4c1e-9a3b-2d5e8f7a1b2c",
  plannedOn: "2026-12-12",
  start: { lat: 47.1978, lng: -8.0061 },
  dropPointIds: ["0b7e3f0a-1c2d-4e5f-8a9b-0c1d2e3f4a5b"],
  assigneeId: "9d8c7b6a-5f4e-4d3c-8b2a-1f0e9d8c7b6a",
};

function fields(input: unknown): Record<string, string> {
  const r = createRunInputSchema.safeParse(input);
  expect(r.success).toBe(false);
  const out: Record<string, string> = {};
  for (const i of r.error!.issues) out[i.path.join(".")] ??= i.message;
  return out;
}

describe("createRunInputSchema", () => {
  it("accepts a run and defaults the optional parts", () => {
    expect(createRunInputSchema.parse(ok)).toMatchObject({ returnToStart: false, notes: "" });
  });
  it("names each missing or wrong field", () => {
    expect(fields({ ...ok, start: {}, dropPointIds: [], assigneeId: "", plannedOn: "12/12/2026" })).toEqual({
      "start.lat": "Start latitude is required",
      "start.lng": "Start longitude is required",
      dropPointIds: "Choose at least one drop point",
      assigneeId: "Choose the volunteer who drives this run",
      plannedOn: "Pick the day of the run",
    });
  });
  it("refuses a drop point chosen twice and a latitude past the pole", () => {
    const out = fields({ ...ok, start: { lat: 90.5, lng: 0 }, dropPointIds: [ok.dropPointIds[0], ok.dropPointIds[0]] });
    expect(out.dropPointIds).toBe("A drop point is chosen twice");
    expect(out["start.lat"]).toMatch(/between −90 and 90/);
  });
});

describe("skipStopInputSchema", () => {
  it("needs a reason of a few words", () => {
    expect(skipStopInputSchema.safeParse({ reason: "  " }).success).toBe(false);
    expect(skipStopInputSchema.parse({ reason: " Gate locked " })).toEqual({ reason: "Gate locked" });
  });
});
